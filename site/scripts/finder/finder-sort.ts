// Row orders for the finder's sortable columns (a permutation, recomputed only when the sort changes).
import type { FinderTable } from './finder-table.ts';

export const SORT_KEYS = [
  'orbit', 'signature', 'jacobi', 'periodDays', 'nu', 'nuV', 'primaryAltKm', 'secondaryAltKm', 'lock', 'holdKm', 'sun', 'ecc',
] as const;
export type SortKey = (typeof SORT_KEYS)[number];
export type SortDirection = 'asc' | 'desc';

export function isSortKey(value: string): value is SortKey {
  return (SORT_KEYS as readonly string[]).includes(value);
}

function compareBy(table: FinderTable, key: SortKey): (a: number, b: number) => number {
  switch (key) {
    case 'orbit':
      return (a, b) => a - b; // the catalog's own order: family, then position along it
    case 'signature': {
      const names = table.meta.signatures;
      return (a, b) => names[table.signature[a]].localeCompare(names[table.signature[b]]) || a - b;
    }
    case 'lock': {
      // by the ratio p/q; orbits without a lock last
      const ratio = table.meta.locks.map((l) => {
        const [p, q] = l.split(':').map(Number);
        return p / q;
      });
      const value = (i: number) => (table.lock[i] < 0 ? Infinity : ratio[table.lock[i]]);
      return (a, b) => value(a) - value(b) || a - b;
    }
    case 'holdKm':
    case 'sun':
    case 'ecc': {
      // unscreened orbits (NaN) after every screened one
      const column = table[key];
      const value = (i: number) => (Number.isNaN(column[i]) ? Infinity : column[i]);
      return (a, b) => value(a) - value(b) || a - b;
    }
    default: {
      const column = table[key];
      return (a, b) => column[a] - column[b] || a - b;
    }
  }
}

export function sortOrder(table: FinderTable, key: SortKey, direction: SortDirection): Int32Array {
  const order = Array.from({ length: table.n }, (_, i) => i);
  const compare = compareBy(table, key);
  // Descending reverses the values; orbits without a synodic lock (or not screened) stay last either way.
  const screened = key === 'holdKm' || key === 'sun' || key === 'ecc';
  const lockless = (i: number) =>
    (key === 'lock' && table.lock[i] < 0) || (screened && Number.isNaN(table[key as 'holdKm' | 'sun' | 'ecc'][i])) ? 1 : 0;
  order.sort(direction === 'asc' ? compare : (a, b) => lockless(a) - lockless(b) || compare(b, a));
  return Int32Array.from(order);
}
