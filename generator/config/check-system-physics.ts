// A system the numerics can work with: a mass ratio whose L1 neck and Jacobi levels are resolvable in
// double precision, and bodies that end before L1 (else nothing passes the neck and every search ends
// in "no family found"). Returns the first problem, naming the config field that set the value.
import { lagrangePoints } from '../core/cr3bp/lagrange-points.ts';
import type { SystemSpec } from '../core/orbits/family-job.ts';
import type { ConfigIssue } from './config-path.ts';
import type { SystemEntry } from './config-schema.ts';
import { formatNumber, formatRange } from './format-value.ts';

/** Below this μ the secondary's Hill radius (μ/3)^(1/3) is under 5e-4 LU and C(L1) − C(L2) under ~1e-6:
 *  the discovery grid and the 1e-12 tolerances can no longer tell the neck apart (smallest real pairs
 *  of interest, e.g. Mars–Deimos, have μ ~ 1e-9; from memory). */
export const MIN_MASS_RATIO = 1e-10;
export const MAX_MASS_RATIO = 0.5;

export function checkSystemPhysics(entry: SystemEntry, index: number, spec: SystemSpec): ConfigIssue | null {
  if (!(spec.mu >= MIN_MASS_RATIO && spec.mu <= MAX_MASS_RATIO)) {
    const field = entry.secondaryGmKm3S2 !== undefined ? 'secondaryGmKm3S2' : entry.primaryGmKm3S2 !== undefined ? 'primaryGmKm3S2' : undefined;
    return {
      path: field === undefined ? ['systems', index] : ['systems', index, field],
      message: `${field === undefined ? '' : `${formatNumber(entry[field]!)} `}gives mass ratio ${formatNumber(Number(spec.mu.toPrecision(6)))} for ${spec.id}, outside the allowed range ${formatRange(MIN_MASS_RATIO, MAX_MASS_RATIO, false, false)} (μ = GM₂ / (GM₁ + GM₂); the primary is the heavier body)`,
    };
  }
  const xL1 = lagrangePoints(spec.mu)[0]!.x;
  const bodies = [
    ['primaryRadiusKm', spec.primaryRadiusKm, xL1 + spec.mu, spec.primaryName],
    ['secondaryRadiusKm', spec.secondaryRadiusKm, 1 - spec.mu - xL1, spec.secondaryName],
  ] as const;
  for (const [field, radiusKm, toL1Nd, body] of bodies) {
    const toL1Km = toL1Nd * spec.lengthUnitKm;
    if (radiusKm < toL1Km) continue;
    // Blame the length unit when it was set and the radius was not (e.g. 1e-9 km with a preset's radii).
    if (entry.lengthUnitKm !== undefined && entry[field] === undefined) {
      return {
        path: ['systems', index, 'lengthUnitKm'],
        message: `${formatNumber(spec.lengthUnitKm)} is too small for ${spec.id}: the ${body} (radius ${formatNumber(radiusKm)} km) must end before L1, so the allowed range starts above ${(radiusKm / toL1Nd).toFixed(1)} km`,
      };
    }
    return {
      path: ['systems', index, field],
      message: `${formatNumber(radiusKm)} is outside the allowed range ${formatRange(0, toL1Km, true, true, 1)} for ${spec.id} (km; the ${body} must end before L1, ${toL1Km.toFixed(1)} km from its centre)`,
    };
  }
  return null;
}
