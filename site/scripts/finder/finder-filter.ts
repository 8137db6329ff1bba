// One filter pass over the finder's columns, driven by the filters of the orbit-field table: each bound
// set becomes one plain comparison per row, rows visited in the current sort order so the result needs no
// sorting. A missing value (NaN, or no text) fails every bound set on its field, as NULL does in SQL.
import { FINDER_FIELDS } from '../../../catalog-db/orbit-fields.ts';
import type { FinderTable } from './finder-table.ts';

/** What the reader asked for, by URL key (e.g. cmin: 3.05, sys: 'earth-moon', stable: true); absent: no bound. */
export type FinderFilter = Record<string, number | string | boolean>;

export const EMPTY_FILTER: FinderFilter = {};

type RowTest = (i: number) => boolean;

/** The row tests of a filter; null when a text value is unknown (then nothing matches). */
function rowTests(table: FinderTable, filter: FinderFilter): RowTest[] | null {
  const tests: RowTest[] = [];
  for (const field of FINDER_FIELDS) {
    const spec = field.filter;
    if (spec === null) continue;
    if (spec.kind === 'range') {
      const column = table.numbers[field.key]!;
      const min = spec.minKey === undefined ? undefined : filter[spec.minKey];
      const max = spec.maxKey === undefined ? undefined : filter[spec.maxKey];
      if (typeof min === 'number') tests.push((i) => column[i]! >= min);
      if (typeof max === 'number') tests.push((i) => column[i]! <= max);
    } else if (spec.kind === 'absMax') {
      const column = table.numbers[field.key]!;
      const max = filter[spec.key];
      if (typeof max === 'number') tests.push((i) => Math.abs(column[i]!) <= max);
    } else if (spec.kind === 'flag') {
      const column = table.numbers[field.key]!;
      if (filter[spec.key] === true) tests.push((i) => column[i] === 1);
    } else {
      const wanted = filter[spec.key];
      if (typeof wanted !== 'string') continue;
      const { dict, codes } = table.texts[field.key]!;
      if (wanted === spec.anyValue) {
        tests.push((i) => codes[i]! >= 0);
        continue;
      }
      const code = dict.indexOf(wanted);
      if (code < 0) return null;
      tests.push((i) => codes[i] === code);
    }
  }
  return tests;
}

/**
 * Writes the indices of the rows that pass into `out` (length ≥ table.n), in the order given by `order`,
 * and returns how many passed.
 */
export function filterRows(table: FinderTable, filter: FinderFilter, order: Int32Array, out: Int32Array): number {
  const tests = rowTests(table, filter);
  if (tests === null) return 0;
  let count = 0;
  rows: for (let k = 0; k < order.length; k++) {
    const i = order[k]!;
    for (const test of tests) if (!test(i)) continue rows;
    out[count++] = i;
  }
  return count;
}
