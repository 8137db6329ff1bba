// The discovery work a run would start, estimated before anything is opened or written, so that an
// absurd config (say 100 levels × 100,000 start points × 64 crossings) is refused with its estimate
// instead of starting silently. The grids dominate the work that can be known in advance; what the
// families then cost depends on what is found.
import { sharedDiscoveryGrids } from './shared-discovery.ts';
import type { FamilyJob } from '../core/orbits/family-job.ts';
import { UsageError } from '../errors/usage-error.ts';

/** Grid points × crossings above which a run needs --force (the demo's grids need 1.5e7). */
export const MAX_GRID_WORK = 2e8;
/** CPU seconds per grid point and crossing (bench/discovery.ts on these machines, rounded up). */
const SECONDS_PER_POINT_CROSSING = 5e-5;

export interface WorkEstimate {
  grids: number;
  gridPoints: number;
  /** Grid points × the crossings followed from each. */
  pointCrossings: number;
  cpuHours: number;
}

export function estimateDiscoveryWork(jobs: readonly FamilyJob[]): WorkEstimate {
  const grids = [...sharedDiscoveryGrids(jobs).values()];
  const gridPoints = grids.reduce((sum, g) => sum + g.gridPoints * g.levels.length, 0);
  const pointCrossings = grids.reduce((sum, g) => sum + g.gridPoints * g.levels.length * g.maxHalfCrossings, 0);
  return { grids: grids.length, gridPoints, pointCrossings, cpuHours: (pointCrossings * SECONDS_PER_POINT_CROSSING) / 3600 };
}

/** Throws a one-line usage error (exit 2) when the discovery work is above the bound and not forced. */
export function assertWorkWithinBound(jobs: readonly FamilyJob[], force: boolean): void {
  const estimate = estimateDiscoveryWork(jobs);
  if (force || estimate.pointCrossings <= MAX_GRID_WORK) return;
  throw new UsageError(
    `discovery work: ${estimate.gridPoints.toExponential(2)} grid points × crossings = ${estimate.pointCrossings.toExponential(2)} ` +
      `(about ${estimate.cpuHours.toFixed(1)} CPU-hours in ${estimate.grids} grids) is above the allowed ${MAX_GRID_WORK.toExponential(0)}; ` +
      'lower gridPoints, jacobiLevels or maxHalfCrossings, or pass --force',
  );
}
