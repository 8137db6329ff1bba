// The shape of one entry of the orbit-field table (orbit-fields.ts): what a per-orbit quantity is called,
// how it reads, how it filters and sorts in the finder, what its CSV column is, and how to get it from the
// catalog rows. Types only, so the browser can import it.
import type { FamilyRow, OrbitRow, SystemRow } from './types.ts';

/** Everything a getter may read: the orbit's rows and what other tables store for it. */
export interface OrbitFieldSource {
  orbit: OrbitRow;
  family: FamilyRow;
  system: SystemRow;
  holdRadiusKm: number | null;
  sunSurvivingFraction: number | null;
  eccentricitySurvivingFraction: number | null;
  /** +1 or −1 on a vertically critical member, null elsewhere. */
  verticalCriticalIndex: number | null;
}

export type FieldValue = number | string | boolean | null;

/** How a value reads: exact (shortest round-trip), significant digits, fixed decimals, whole percent, a
 *  stability index (site/lib/format-stability-index.ts: never rounded onto or across ±1). */
export type FieldFormat =
  | { style: 'exact' }
  | { style: 'index' }
  | { style: 'sig'; digits: number }
  | { style: 'fixed'; digits: number }
  | { style: 'percent' }
  | { style: 'text' }
  | { style: 'flag'; yes: string; no: string };

/** A finder filter and its URL keys: range bounds, a bound on |value|, one text value, or a flag set. */
export type FieldFilter =
  | { kind: 'range'; minKey?: string; maxKey?: string }
  | { kind: 'absMax'; key: string }
  | { kind: 'choice'; key: string; anyValue?: string }
  | { kind: 'flag'; key: string };

export interface OrbitField {
  /** Name in code, in JSON exports and in the finder's data file. */
  key: string;
  /** Label without the unit; the page may name the bodies. */
  label: string | ((bodies: { primaryName: string; secondaryName: string }) => string);
  unit: string | null;
  type: 'number' | 'text' | 'flag';
  format: FieldFormat;
  /** CSV column (the catalog's and the finder's), null: not written to CSV. */
  csv: string | null;
  /** In the catalog's CSV export (catalog-db/export-catalog.ts), in table order. */
  catalogCsv: boolean;
  /** column: a finder column (and in its exports); data: carried for filters and exports only; null: not in the finder. */
  finder: 'column' | 'data' | null;
  filter: FieldFilter | null;
  /** How the finder sorts by it: by value (missing values last) or by catalog order; null: not sortable. */
  sort: 'value' | 'catalog' | null;
  /** Text values in this order (e.g. synodic locks by ratio); default: alphabetical. */
  compareText?: (a: string, b: string) => number;
  /** The finder cell links to the orbit page. */
  link?: boolean;
  /** Shown in the orbit page's numbers. */
  page: boolean;
  get: (source: OrbitFieldSource) => FieldValue;
}
