// The finder's data asset (data/finder.json): one column per finder field of the orbit-field table
// (catalog-db/orbit-fields.ts), row i = orbit i. Numbers (and flags as 1/0) as they are, null where absent;
// text as codes into a sorted list of its values (−1: none), so sorting by a code is sorting by the text.
// Shared by the build (which writes it) and the browser (which reads it into typed arrays); in site/lib so
// that site/scripts imports site/lib and never the other way round.

import type { RunRow, SystemRow } from '../../catalog-db/types.ts';

export const FINDER_DATA_VERSION = 4;

/** What an export says about a system: its id and name, μ, units and where they come from. */
export const FINDER_SYSTEM_KEYS = ['id', 'name', 'mu', 'lengthUnitKm', 'timeUnitS', 'primaryName', 'secondaryName', 'source'] as const;
export type FinderSystemInfo = Pick<SystemRow, (typeof FINDER_SYSTEM_KEYS)[number]>;

/** What an export says about a catalog run: version, commit, scenario, integrator tolerances, dates. */
export const FINDER_RUN_KEYS = ['id', 'generatorVersion', 'gitCommit', 'scenarioName', 'rtol', 'atol', 'startedAt', 'finishedAt'] as const;
export type FinderRunInfo = Pick<RunRow, (typeof FINDER_RUN_KEYS)[number]>;

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
