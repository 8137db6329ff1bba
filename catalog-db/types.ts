import type { AuditRow } from './audit-types.ts';
import type { BifurcationRow, FamilyBundle, FamilyRow, OrbitRow, SignatureChangeRow, StableWindowRow } from '../generator/core/orbits/family-rows.ts';
import type { HoldRadiusRow, ModelScreeningRow } from '../generator/core/orbits/screening-rows.ts';
// The rows of one family are the core's result types (the core may not import catalog-db); they are
// re-exported here because they are also the storage contract.
export type {
  BifurcationKind, BifurcationRow, FamilyBundle, FamilyKind, FamilyRow, OrbitRow, SignatureChangeRow, StabilityPlane, StableWindowRow,
} from '../generator/core/orbits/family-rows.ts';
export type { HoldRadiusRow, ModelScreeningRow, ScreeningModelName, OrbitScreenings } from '../generator/core/orbits/screening-rows.ts';
export type { AuditMiss, AuditRow } from './audit-types.ts';

// Row shapes of the SQLite catalog, shared by the generator (writes) and the site (reads).
// Lengths and times are nondimensional unless the name carries a unit (Km, Days, S).

export interface SystemRow {
  id: string; // e.g. "earth-moon"
  name: string; // e.g. "Earth–Moon"
  mu: number;
  lengthUnitKm: number;
  timeUnitS: number;
  primaryName: string;
  secondaryName: string;
  primaryLetter: string; // lap-signature letter, e.g. "E"
  secondaryLetter: string; // e.g. "M"
  primaryRadiusKm: number;
  secondaryRadiusKm: number;
  synodicPeriodDays: number | null; // null where no synodic period is configured
  source: string; // where μ, LU, TU and radii come from
}

export interface RunRow {
  id: number;
  generatorVersion: string;
  gitCommit: string;
  configHash: string;
  configPath: string;
  scenarioName: string;
  scenarioDescription: string;
  rtol: number;
  atol: number;
  shard: string; // "k/n", "1/1" when not sharded
  startedAt: string; // ISO 8601
  finishedAt: string | null; // null while running or after an interruption
}

/** The invented scenario a catalog belongs to, kept in the meta table. */
export interface ScenarioMeta {
  name: string;
  description: string;
  team: string;
}

/** A job as the generator got it (generator/core/orbits/family-job.ts FamilyJob): its key and every
 *  setting its results depend on. The writer stores the whole object as the job's settings (JSON). */
export interface JobWithSettings {
  readonly key: string;
}

/** A done job's row: its settings as stored (the JSON of the JobWithSettings it was marked done with). */
export interface StoredJobSettings {
  jobKey: string;
  runId: number;
  doneAt: string; // ISO 8601
  settings: { key: string } & Record<string, unknown>;
}

/** Read side of the catalog, used by the site build and by `export`. Implemented in catalog-db/query.ts. */
export interface CatalogReader {
  systems(): SystemRow[];
  runs(): RunRow[]; // newest first
  families(): FamilyRow[]; // ordered by systemId, then signature, then id
  family(id: string): FamilyRow | undefined;
  orbits(familyId?: string): OrbitRow[]; // ordered by familyId, seq
  orbit(id: string): OrbitRow | undefined;
  stableWindows(familyId?: string): StableWindowRow[];
  bifurcations(familyId?: string): BifurcationRow[];
  /** Hold radii of screened stable members, ordered by familyId, then the orbit's seq. */
  holdRadii(familyId?: string): HoldRadiusRow[];
  /** Sun and eccentricity screenings, ordered by familyId, the orbit's seq, then model. */
  modelScreenings(familyId?: string): ModelScreeningRow[];
  /** Family ends where the lap signature changes, ordered by familyId, then side. */
  signatureChanges(familyId?: string): SignatureChangeRow[];
  scenario(): ScenarioMeta | null; // null until setScenario has been called
  /** Every done job with the settings it was computed with, ordered by jobKey. */
  jobSettings(): StoredJobSettings[];
  /** Completeness audits (`cycler-atlas audit`), newest first. */
  audits(): AuditRow[];
  /** The newest audit; undefined for a catalog never audited. */
  latestAudit(): AuditRow | undefined;
  close(): void;
}

/** Write side, used by the generator. Every call is one transaction. */
export interface CatalogWriter {
  upsertSystem(system: SystemRow): void;
  startRun(run: Omit<RunRow, 'id' | 'finishedAt'>): number; // returns the run id
  finishRun(runId: number, finishedAtIso: string): void;
  /** True once every family of this config entry (job) has been written (resume skips it). */
  jobDone(jobKey: string): boolean;
  /** One transaction: replaces any family with the same id (and everything under it), all or nothing.
   *  With completesJob, the job is marked done (its settings stored) in the same transaction. */
  writeFamily(bundle: FamilyBundle, completesJob?: JobWithSettings): void;
  /** Marks a job done that produced no family (e.g. nothing found), with its settings, in one transaction. */
  markJobDone(job: JobWithSettings, runId: number): void;
  /** Records the family a signature change continues into (null: none found) and whether it was followed up. */
  linkSignatureChange(familyId: string, side: SignatureChangeRow['side'], link: Pick<SignatureChangeRow, 'intoFamilyId' | 'followedUp'>): void;
  /** Stores the scenario's name, description and team (replaces any earlier ones). */
  setScenario(scenario: ScenarioMeta): void;
  /** Stores a finished completeness audit (one transaction); returns its id. */
  writeAudit(audit: Omit<AuditRow, 'id'>): number;
  /** One transaction: deletes every family of the given systems and of the given jobs (with everything
   *  under them) and the given jobs' done marks, so that a run recomputes them. Returns what went. */
  forgetResults(what: { systemIds: readonly string[]; jobKeys: readonly string[] }): { families: number; jobs: number };
  close(): void;
}
