// The family row's summary columns, derived from its orbits and windows (the writer checks they agree).
import type { FamilyRow, OrbitRow, StableWindowRow } from './family-rows.ts';

export type FamilySummary = Pick<FamilyRow, 'memberCount' | 'jacobiMin' | 'jacobiMax' | 'periodDaysMin' | 'periodDaysMax' | 'stableWindowCount'>;

export function familySummary(orbits: readonly OrbitRow[], stableWindows: readonly StableWindowRow[]): FamilySummary {
  const jacobis = orbits.map((o) => o.jacobi);
  const periods = orbits.map((o) => o.periodDays);
  return {
    memberCount: orbits.length,
    jacobiMin: Math.min(...jacobis),
    jacobiMax: Math.max(...jacobis),
    periodDaysMin: Math.min(...periods),
    periodDaysMax: Math.max(...periods),
    stableWindowCount: stableWindows.length,
  };
}
