// Stored results are only valid for the settings they were computed with. Before a run writes
// anything, compare the config's systems and jobs with what the catalog holds: a changed system
// constant invalidates every family of that system, a changed setting of a done job that job's
// families. A job stopped part-way has no stored settings yet: its written families count as changed
// when a run with another config wrote them (resume would go on after them with the new settings).
// Refused unless the user asks to recompute them (generate --recompute-changed).
import { firstSettingDifference, formatSettingDifference } from '../../catalog-db/job-settings.ts';
import { openCatalogForRead } from '../../catalog-db/open-catalog.ts';
import { firstSystemConstantDifference } from '../../catalog-db/system-constants.ts';
import type { CatalogReader, CatalogWriter } from '../../catalog-db/types.ts';
import type { FamilyJob, SystemSpec } from '../core/orbits/family-job.ts';
import { UsageError } from '../errors/usage-error.ts';

export const RECOMPUTE_OPTION = '--recompute-changed';

export interface SettingsChanges {
  /** One line per change, the first one first. */
  lines: string[];
  /** Systems whose constants changed: all their families go. */
  systemIds: string[];
  /** Done jobs whose settings changed (or whose system did): their families and done marks go. */
  jobKeys: string[];
}

export function findSettingsChanges(
  reader: CatalogReader,
  systems: readonly SystemSpec[],
  jobs: readonly FamilyJob[],
  configHash: string,
): SettingsChanges {
  const changes: SettingsChanges = { lines: [], systemIds: [], jobKeys: [] };
  const storedSystems = new Map(reader.systems().map((system) => [system.id, system]));
  for (const system of systems) {
    const stored = storedSystems.get(system.id);
    const field = stored === undefined ? null : firstSystemConstantDifference(stored, system);
    if (stored === undefined || field === null) continue;
    changes.systemIds.push(system.id);
    changes.lines.push(`${system.id} system constant ${field} differs from the catalog's (${stored[field]} → ${system[field]})`);
  }
  const storedJobs = reader.jobSettings();
  const changedSystems = new Set(changes.systemIds);
  for (const stored of storedJobs) {
    const systemId = (stored.settings.system as { id?: unknown } | undefined)?.id;
    if (typeof systemId === 'string' && changedSystems.has(systemId)) changes.jobKeys.push(stored.jobKey);
  }
  const storedByKey = new Map(storedJobs.map((stored) => [stored.jobKey, stored]));
  for (const job of jobs) {
    const stored = storedByKey.get(job.key);
    if (stored === undefined || changes.jobKeys.includes(job.key)) continue;
    const difference = firstSettingDifference(stored.settings, job);
    if (difference === null) continue;
    changes.jobKeys.push(job.key);
    changes.lines.push(`job ${job.key} setting ${formatSettingDifference(difference)} differs from the catalog's`);
  }
  const runHashes = new Map(reader.runs().map((run) => [run.id, run.configHash]));
  const stoppedFamilies = reader.families().filter((family) => !storedByKey.has(family.configKey) && !changes.jobKeys.includes(family.configKey));
  for (const job of jobs) {
    const other = stoppedFamilies.find((family) => family.configKey === job.key && runHashes.get(family.runId) !== configHash);
    if (other === undefined) continue;
    changes.jobKeys.push(job.key);
    changes.lines.push(`job ${job.key} was stopped part-way by run ${other.runId} with another config (its written families may follow other settings)`);
  }
  return changes;
}

export interface SettleOptions {
  writer: CatalogWriter;
  dbPath: string;
  configPath: string;
  systems: readonly SystemSpec[];
  jobs: readonly FamilyJob[];
  /** sha256 of this run's config text (runs.config_hash). */
  configHash: string;
  recompute: boolean;
  log: (line: string) => void;
}

/** Throws (exit 2) on a change unless recompute; with recompute deletes what changed, so it is run again. */
export function settleSettingsChanges(options: SettleOptions): void {
  const reader = openCatalogForRead(options.dbPath);
  let changes: SettingsChanges;
  try {
    changes = findSettingsChanges(reader, options.systems, options.jobs, options.configHash);
  } finally {
    reader.close();
  }
  const [first] = changes.lines;
  if (first === undefined) return;
  const more = changes.lines.length > 1 ? ` (and ${changes.lines.length - 1} more change(s))` : '';
  if (!options.recompute) {
    throw new UsageError(
      `config ${options.configPath}: ${first}${more}; ${RECOMPUTE_OPTION} deletes and recomputes the affected families`,
    );
  }
  const gone = options.writer.forgetResults(changes);
  options.log(`recompute: ${first}${more}; deleted ${gone.families} families and ${gone.jobs} done job(s) to compute again`);
}
