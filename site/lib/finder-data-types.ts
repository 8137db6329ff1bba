// The finder's data asset (data/finder.json): one column per finder field of the orbit-field table
// (catalog-db/orbit-fields.ts), row i = orbit i. Numbers (and flags as 1/0) as they are, null where absent;
// text as codes into a sorted list of its values (−1: none), so sorting by a code is sorting by the text.
// Shared by the build (which writes it) and the browser (which reads it into typed arrays); in site/lib so
// that site/scripts imports site/lib and never the other way round.

export const FINDER_DATA_VERSION = 4;

/** What an export says about a system: its id and name, μ, units and where they come from. */
export interface FinderSystemInfo {
  id: string;
  name: string;
  mu: number;
  lengthUnitKm: number;
  timeUnitS: number;
  primaryName: string;
  secondaryName: string;
  source: string;
}

/** What an export says about a catalog run: version, commit, scenario, integrator tolerances, dates. */
export interface FinderRunInfo {
  id: number;
  generatorVersion: string;
  gitCommit: string;
  scenarioName: string;
  rtol: number;
  atol: number;
  startedAt: string;
  finishedAt: string | null;
}

export type FinderColumnData = { values: Array<number | null> } | { dict: string[]; codes: number[] };

export interface FinderDataFile {
  version: number;
  count: number;
  /** By field key. */
  columns: Record<string, FinderColumnData>;
  /** Every system and run of the catalog, for the exports' metadata (rows name them by systemId and runId). */
  systems: FinderSystemInfo[];
  runs: FinderRunInfo[];
}
