// The discovery grids a lap-signature job needs: one per segment and start direction, at the loose
// tolerance of the seed search, over the job's Jacobi levels.
import type { AxisSegment, FamilyJob } from '../family-job.ts';
import type { DiscoveryRequest } from './discover-candidates.ts';
import { lagrangePoints } from '../../cr3bp/lagrange-points.ts';

/** Far sides are scanned out to this distance from the nearer primary (nondimensional). */
export const FAR_SIDE_REACH_ND = 1.2;

export function jobDiscoveryRequests(job: FamilyJob): DiscoveryRequest[] {
  const rule = job.seed;
  if (rule.kind !== 'lap-signature') return [];
  const { system, tolerance, limits } = job;
  const base = {
    mu: system.mu,
    gridPoints: rule.gridPoints,
    levels: [...rule.jacobiValues].sort((a, b) => a - b),
    maxHalfCrossings: rule.maxHalfCrossings,
    // Signs, crossing times and lap counts only: Newton with the STM polishes every seed later.
    rtol: Math.max(tolerance.rtol, 1e-10),
    atol: Math.max(tolerance.atol, 1e-10),
    maxHalfTimeNd: limits.maxPeriodNd / 2,
    primaryRadiusNd: system.primaryRadiusKm / system.lengthUnitKm,
    secondaryRadiusNd: system.secondaryRadiusKm / system.lengthUnitKm,
    xL1: lagrangePoints(system.mu)[0]!.x,
    reachNd: FAR_SIDE_REACH_ND,
  };
  return rule.segments.flatMap((segment: AxisSegment) => rule.directions.map((direction) => ({ ...base, segment, direction })));
}
