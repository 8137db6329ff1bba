// A stable window's row from its edge and middle orbits: edges in C and in altitude above the smaller body.
import type { OrbitRow, StableWindowRow } from './family-rows.ts';

export function stableWindowRow(id: string, familyId: string, from: OrbitRow, to: OrbitRow, middle: OrbitRow): StableWindowRow {
  return {
    id,
    familyId,
    fromJacobi: from.jacobi,
    toJacobi: to.jacobi,
    fromSecondaryMinAltKm: from.secondaryMinAltKm,
    toSecondaryMinAltKm: to.secondaryMinAltKm,
    widthKm: Math.abs(to.secondaryMinAltKm - from.secondaryMinAltKm),
    widthJacobi: Math.abs(to.jacobi - from.jacobi),
    fromArclength: from.arclength,
    toArclength: to.arclength,
    midOrbitId: middle.id,
    midPeriodDays: middle.periodDays,
  };
}
