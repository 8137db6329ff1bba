// One filter pass over the finder's columns: a single loop, every bound a plain comparison (an absent
// bound is ±Infinity), visiting rows in the current sort order so the result needs no sorting.
import type { FinderTable } from './finder-table.ts';

export type VerticalFilter = 'any' | 'stable' | 'unstable';

/** What the reader asked for; null = no bound. Ids and labels, not indices, so links outlive a rebuild. */
export interface FinderFilter {
  system: string | null;
  family: string | null;
  signature: string | null;
  jacobiMin: number | null;
  jacobiMax: number | null;
  periodDaysMin: number | null;
  periodDaysMax: number | null;
  stableOnly: boolean;
  nuAbsMax: number | null;
  vertical: VerticalFilter;
  primaryAltKmMin: number | null;
  primaryAltKmMax: number | null;
  secondaryAltKmMin: number | null;
  secondaryAltKmMax: number | null;
  /** "p:q", or "any" for every orbit that has a synodic lock. */
  lock: string | null;
  /** Lower bounds on the screening results; an unscreened orbit fails any of them. */
  holdKmMin: number | null;
  sunFractionMin: number | null;
  eccFractionMin: number | null;
}

export const EMPTY_FILTER: FinderFilter = {
  system: null, family: null, signature: null, jacobiMin: null, jacobiMax: null, periodDaysMin: null,
  periodDaysMax: null, stableOnly: false, nuAbsMax: null, vertical: 'any', primaryAltKmMin: null,
  primaryAltKmMax: null, secondaryAltKmMin: null, secondaryAltKmMax: null, lock: null, holdKmMin: null,
  sunFractionMin: null, eccFractionMin: null,
};

const lo = (v: number | null) => (v === null ? -Infinity : v);
const hi = (v: number | null) => (v === null ? Infinity : v);

/**
 * Writes the indices of the rows that pass into `out` (length ≥ table.n), in the order given by `order`,
 * and returns how many passed. An unknown system, family, signature or lock matches nothing.
 */
export function filterRows(table: FinderTable, filter: FinderFilter, order: Int32Array, out: Int32Array): number {
  const { meta } = table;
  const systemWanted = filter.system === null ? -1 : meta.systems.findIndex((s) => s.id === filter.system);
  const familyWanted = filter.family === null ? -1 : meta.families.findIndex((f) => f.id === filter.family);
  const signatureWanted = filter.signature === null ? -1 : meta.signatures.indexOf(filter.signature);
  const anyLock = filter.lock === 'any';
  const lockWanted = filter.lock === null || anyLock ? -1 : meta.locks.indexOf(filter.lock);
  if ((filter.system !== null && systemWanted < 0) || (filter.family !== null && familyWanted < 0) ||
    (filter.signature !== null && signatureWanted < 0) || (filter.lock !== null && !anyLock && lockWanted < 0)) {
    return 0;
  }
  const useSystem = systemWanted >= 0, useFamily = familyWanted >= 0, useSignature = signatureWanted >= 0;
  const useLock = lockWanted >= 0;
  const cLo = lo(filter.jacobiMin), cHi = hi(filter.jacobiMax);
  const pLo = lo(filter.periodDaysMin), pHi = hi(filter.periodDaysMax);
  const nuMax = hi(filter.nuAbsMax);
  const a1Lo = lo(filter.primaryAltKmMin), a1Hi = hi(filter.primaryAltKmMax);
  const a2Lo = lo(filter.secondaryAltKmMin), a2Hi = hi(filter.secondaryAltKmMax);
  const stableOnly = filter.stableOnly;
  // NaN (not screened) fails `!(v >= bound)`, so these bounds are checked only when set.
  const useHold = filter.holdKmMin !== null, hLo = lo(filter.holdKmMin);
  const useSun = filter.sunFractionMin !== null, sunLo = lo(filter.sunFractionMin);
  const useEcc = filter.eccFractionMin !== null, eccLo = lo(filter.eccFractionMin);
  const vertical = filter.vertical === 'stable' ? 1 : filter.vertical === 'unstable' ? 2 : 0;
  const { family, familySystem, signature, jacobi, periodDays, nu, nuV, primaryAltKm, secondaryAltKm, stable, lock, holdKm, sun, ecc } = table;
  const n = order.length;
  let count = 0;
  for (let k = 0; k < n; k++) {
    const i = order[k];
    if (useFamily && family[i] !== familyWanted) continue;
    if (useSystem && familySystem[family[i]] !== systemWanted) continue;
    if (useSignature && signature[i] !== signatureWanted) continue;
    const c = jacobi[i];
    if (c < cLo || c > cHi) continue;
    const p = periodDays[i];
    if (p < pLo || p > pHi) continue;
    if (stableOnly && stable[i] !== 1) continue;
    if (Math.abs(nu[i]) > nuMax) continue;
    if (vertical === 1 && !(Math.abs(nuV[i]) < 1)) continue;
    if (vertical === 2 && Math.abs(nuV[i]) < 1) continue;
    const a1 = primaryAltKm[i];
    if (a1 < a1Lo || a1 > a1Hi) continue;
    const a2 = secondaryAltKm[i];
    if (a2 < a2Lo || a2 > a2Hi) continue;
    if (anyLock && lock[i] < 0) continue;
    if (useLock && lock[i] !== lockWanted) continue;
    if (useHold && !(holdKm[i] >= hLo)) continue;
    if (useSun && !(sun[i] >= sunLo)) continue;
    if (useEcc && !(ecc[i] >= eccLo)) continue;
    out[count++] = i;
  }
  return count;
}
