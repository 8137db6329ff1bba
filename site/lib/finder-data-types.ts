// The finder's data asset (data/finder.json): one column per finder field of the orbit-field table
// (catalog-db/orbit-fields.ts), row i = orbit i. Numbers (and flags as 1/0) as they are, null where absent;
// text as codes into a sorted list of its values (−1: none), so sorting by a code is sorting by the text.
// Shared by the build (which writes it) and the browser (which reads it into typed arrays); in site/lib so
// that site/scripts imports site/lib and never the other way round.

export const FINDER_DATA_VERSION = 3;

export type FinderColumnData = { values: Array<number | null> } | { dict: string[]; codes: number[] };

export interface FinderDataFile {
  version: number;
  count: number;
  /** By field key. */
  columns: Record<string, FinderColumnData>;
}
