// Merges shard catalogs (written by `--shard k/n` runs) into one catalog file.
// Rules: runs are copied under new ids (a run already present, same start time, shard, config and
// commit, is reused, so merging the same shard twice adds nothing); for a family id present twice the
// copy whose run finished later wins (an unfinished run counts as oldest; on a tie the copy already in
// the output stays); a system present twice must agree on its physical constants and letters; meta
// keys already set in the output are kept, but a different scenario name is refused; a job done in
// both with different settings (other tolerances, limits, seed rule: another config) is refused. Each
// input is merged in its own transaction: a failing input leaves the inputs merged before it in place.
import type { Database } from 'better-sqlite3';
import { firstSettingDifference, formatSettingDifference } from './job-settings.ts';
import { closeWritable, openSqliteForRead, openSqliteForWrite } from './open-sqlite.ts';
import { createCatalogReader } from './query.ts';
import { prepareReplaceFamily } from './replace-family.ts';
import { isCatalogOrSideFile } from './same-file.ts';
import type { SqlRecord } from './row-mapping.ts';
import { firstSystemConstantDifference } from './system-constants.ts';
import { runTable, systemTable } from './table-columns.ts';
import type { CatalogReader, RunRow, StoredJobSettings, SystemRow } from './types.ts';

/** The inputs do not belong together (other physics, scenario or job settings): bad input, not a failure. */
export class MergeRefusedError extends Error {
  override name = 'MergeRefusedError';
}

export interface MergeInputReport {
  path: string;
  runsAdded: number;
  familiesWritten: number; // new, or newer than the copy already in the output
  familiesSkipped: number; // the output already held a copy from a run that finished as late or later
  jobsMerged: number;
}

export interface MergeReport {
  outPath: string;
  inputs: MergeInputReport[];
}

export function mergeCatalogs(outPath: string, inPaths: readonly string[]): MergeReport {
  if (!Array.isArray(inPaths) || inPaths.length === 0) {
    throw new Error('mergeCatalogs: inPaths must list at least one input catalog');
  }
  for (const path of inPaths) {
    if (isCatalogOrSideFile(path, outPath) || isCatalogOrSideFile(outPath, path)) {
      throw new MergeRefusedError(`mergeCatalogs: input ${path} is the output catalog itself (${outPath}, once links are resolved)`);
    }
  }
  // Open (and so check) every input before the output is touched.
  const inputs: Database[] = [];
  try {
    for (const path of inPaths) inputs.push(openSqliteForRead(path));
  } catch (error) {
    for (const db of inputs) db.close();
    throw error;
  }
  const out = openSqliteForWrite(outPath);
  try {
    const mergeInput = prepareMergeInput(out, outPath);
    return {
      outPath,
      inputs: inputs.map((db, index) => mergeInput(db, inPaths[index] as string)),
    };
  } finally {
    closeWritable(out);
    for (const db of inputs) db.close();
  }
}

function prepareMergeInput(out: Database, outPath: string) {
  const outReader = createCatalogReader(out); // not closed: it shares `out`, which mergeCatalogs closes
  const replaceFamily = prepareReplaceFamily(out);
  const insertSystem = out.prepare(systemTable.insertSql);
  const insertRun = out.prepare(runTable.insertSql);
  const findRun = out.prepare(
    'SELECT * FROM runs WHERE started_at = @started_at AND shard = @shard AND config_hash = @config_hash ' +
      'AND config_path = @config_path AND git_commit = @git_commit AND generator_version = @generator_version',
  );
  const outRun = out.prepare('SELECT * FROM runs WHERE id = ?');
  const setRunFinished = out.prepare('UPDATE runs SET finished_at = ? WHERE id = ?');
  const relink = out.prepare(`UPDATE signature_changes SET into_family_id = @into
    WHERE family_id = @family AND side = @side AND into_family_id IS NULL AND EXISTS (SELECT 1 FROM families WHERE id = @into)`);
  const upsertJob = out.prepare(
    'INSERT INTO jobs (job_key, run_id, done_at, settings) VALUES (?, ?, ?, ?) ON CONFLICT (job_key) DO UPDATE ' +
      'SET run_id = excluded.run_id, done_at = excluded.done_at, settings = excluded.settings WHERE excluded.done_at > jobs.done_at',
  );
  const outMeta = out.prepare('SELECT value FROM meta WHERE key = ?').pluck();
  const insertMeta = out.prepare('INSERT INTO meta (key, value) VALUES (?, ?)');

  const mergeSystem = (system: SystemRow, inPath: string) => {
    const existing = outReader.systems().find((s) => s.id === system.id);
    if (existing === undefined) {
      insertSystem.run(systemTable.toRecord(system));
      return;
    }
    const field = firstSystemConstantDifference(existing, system);
    if (field !== null) {
      throw new MergeRefusedError(
        `mergeCatalogs: system ${system.id} differs between ${outPath} and ${inPath} ` +
          `(${field}: ${existing[field]} vs ${system[field]})`,
      );
    }
  };

  /** Returns the output id of the run and whether it was added. */
  const mergeRun = (run: RunRow): { id: number; added: boolean } => {
    const record = runTable.toRecord(run);
    const twin = findRun.get(record) as SqlRecord | undefined;
    if (twin !== undefined) {
      const existing = runTable.fromRecord(twin);
      if (finishedTime(run) > finishedTime(existing)) setRunFinished.run(run.finishedAt, existing.id);
      return { id: existing.id, added: false };
    }
    record.id = null; // renumbered: NULL lets SQLite pick the next id
    return { id: Number(insertRun.run(record).lastInsertRowid), added: true };
  };

  const mergeMeta = (input: Database, inPath: string) => {
    const rows = input.prepare('SELECT key, value FROM meta ORDER BY key').all() as Array<{ key: string; value: string }>;
    for (const { key, value } of rows) {
      const existing = outMeta.get(key) as string | undefined;
      if (existing === undefined) insertMeta.run(key, value);
      else if (key === 'scenario.name' && existing !== value) {
        throw new MergeRefusedError(`mergeCatalogs: scenario name differs: "${existing}" in ${outPath}, "${value}" in ${inPath}`);
      }
    }
  };

  const merge = (input: Database, inPath: string): MergeInputReport => {
    const reader: CatalogReader = createCatalogReader(input); // shares `input`; closed by mergeCatalogs
    const report: MergeInputReport = { path: inPath, runsAdded: 0, familiesWritten: 0, familiesSkipped: 0, jobsMerged: 0 };
    mergeMeta(input, inPath);
    for (const system of reader.systems()) mergeSystem(system, inPath);
    const jobs = reader.jobSettings();
    assertSameJobSettings(jobs, outReader, outPath, inPath);

    const inRuns = new Map(reader.runs().map((run) => [run.id, run]));
    const runIdMap = new Map<number, number>();
    for (const run of [...inRuns.values()].sort((a, b) => a.id - b.id)) {
      const merged = mergeRun(run);
      runIdMap.set(run.id, merged.id);
      if (merged.added) report.runsAdded += 1;
    }

    // Rewriting a family unlinks the signature changes that continue into it (ON DELETE SET NULL): the
    // links of both catalogs are put back once every family is in place.
    const links = [...outReader.signatureChanges(), ...reader.signatureChanges()].filter((c) => c.intoFamilyId !== null);
    for (const family of reader.families()) {
      const existing = outReader.family(family.id);
      if (existing !== undefined) {
        const existingRun = runTable.fromRecord(outRun.get(existing.runId) as SqlRecord);
        if (!(finishedTime(inRuns.get(family.runId) as RunRow) > finishedTime(existingRun))) {
          report.familiesSkipped += 1;
          continue;
        }
      }
      replaceFamily({
        family: { ...family, runId: runIdMap.get(family.runId) as number },
        orbits: reader.orbits(family.id),
        stableWindows: reader.stableWindows(family.id),
        bifurcations: reader.bifurcations(family.id),
        holdRadii: reader.holdRadii(family.id),
        modelScreenings: reader.modelScreenings(family.id),
        signatureChanges: reader.signatureChanges(family.id),
      });
      report.familiesWritten += 1;
    }

    for (const c of links) relink.run({ into: c.intoFamilyId, family: c.familyId, side: c.side });

    for (const job of jobs) upsertJob.run(job.jobKey, runIdMap.get(job.runId), job.doneAt, JSON.stringify(job.settings));
    report.jobsMerged = jobs.length;
    return report;
  };

  return (input: Database, inPath: string): MergeInputReport => {
    try {
      return out.transaction(() => merge(input, inPath)).immediate();
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      if (message.startsWith('mergeCatalogs:')) throw error;
      throw new Error(`mergeCatalogs: ${inPath} not merged (${message})`, { cause: error });
    }
  };
}

/** A job done in both catalogs must have been computed with the same settings. */
function assertSameJobSettings(jobs: StoredJobSettings[], outReader: CatalogReader, outPath: string, inPath: string): void {
  const outJobs = new Map(outReader.jobSettings().map((job) => [job.jobKey, job]));
  for (const job of jobs) {
    const existing = outJobs.get(job.jobKey);
    const difference = existing === undefined ? null : firstSettingDifference(existing.settings, job.settings);
    if (difference === null) continue;
    throw new MergeRefusedError(
      `mergeCatalogs: job ${job.jobKey} differs between ${outPath} and ${inPath}: ${formatSettingDifference(difference)} ` +
        '(computed with other settings; merge only catalogs of the same config)',
    );
  }
}

/** Milliseconds since 1970 of the run's end; an unfinished run counts as the oldest. */
function finishedTime(run: RunRow): number {
  const time = run.finishedAt === null ? Number.NaN : Date.parse(run.finishedAt);
  return Number.isNaN(time) ? Number.NEGATIVE_INFINITY : time;
}
