// Row orders for the finder's sortable columns (a permutation, recomputed only when the sort changes), as
// the orbit-field table says: by value (text by its sorted code), or by catalog order. Rows without a
// value (not screened, no synodic lock) stay last in both directions.
import { FINDER_COLUMNS } from '../../../catalog-db/orbit-fields.ts';
import type { FinderTable } from './finder-table.ts';

export type SortDirection = 'asc' | 'desc';

export function isSortKey(value: string): boolean {
  return FINDER_COLUMNS.some((field) => field.key === value && field.sort !== null);
}

/** The sort value of each row; NaN for a row without a value. */
function sortValues(table: FinderTable, key: string): (i: number) => number {
  const field = FINDER_COLUMNS.find((f) => f.key === key);
  if (field === undefined || field.sort === null) throw new RangeError(`sort: "${key}" is not a sortable column`);
  if (field.sort === 'catalog') return (i) => i;
  if (field.type === 'text') {
    const codes = table.texts[key]!.codes;
    return (i) => (codes[i]! < 0 ? NaN : codes[i]!);
  }
  const column = table.numbers[key]!;
  return (i) => column[i]!;
}

export function sortOrder(table: FinderTable, key: string, direction: SortDirection): Int32Array {
  const value = sortValues(table, key);
  const sign = direction === 'asc' ? 1 : -1;
  const order = Array.from({ length: table.n }, (_, i) => i);
  order.sort((a, b) => {
    const va = value(a), vb = value(b);
    const missing = Number(Number.isNaN(va)) - Number(Number.isNaN(vb));
    if (missing !== 0) return missing;
    return (Number.isNaN(va) ? 0 : sign * (va - vb)) || a - b;
  });
  return Int32Array.from(order);
}
