// Samples of a trajectory (evenly spaced, or at given times), read off DOP853's dense output (no step-size restriction).
import { spatialEquations } from '../cr3bp/equations-spatial.ts';
import { assertMassRatio } from '../cr3bp/lagrange-points.ts';
import { evaluateDenseOutput, integrateDop853, type Dop853Workspace, type StepObserver } from '../dop853/index.ts';
import { workspaceFor } from './workspace-cache.ts';
import { DEFAULT_TOLERANCE, type Tolerance } from './tolerance.ts';

export interface TrajectorySamples {
  timesNd: Float64Array;
  /** 6 numbers per sample (x, y, z, vx, vy, vz); sample i is at timesNd[i]. */
  states: Float64Array;
}

class Sampler implements StepObserver {
  next = 1;
  constructor(private readonly samples: TrajectorySamples, private readonly count: number) {}

  afterStep(ws: Dop853Workspace, _tOld: number, tNew: number): number {
    const { timesNd, states } = this.samples;
    const forward = tNew >= timesNd[0];
    while (this.next < this.count && (forward ? timesNd[this.next] <= tNew : timesNd[this.next] >= tNew)) {
      evaluateDenseOutput(ws, timesNd[this.next], states.subarray(6 * this.next, 6 * this.next + 6), 6);
      this.next++;
    }
    return NaN;
  }
}

export function sampleTrajectory(
  mu: number, state0: ArrayLike<number>, durationNd: number, sampleCount: number,
  tolerance: Tolerance = DEFAULT_TOLERANCE,
): TrajectorySamples {
  if (!Number.isInteger(sampleCount) || sampleCount < 2) {
    throw new RangeError(`sampleCount must be an integer ≥ 2, got ${sampleCount}`);
  }
  if (!Number.isFinite(durationNd) || durationNd === 0) throw new RangeError(`durationNd must be a nonzero finite number, got ${durationNd}`);
  const timesNd = new Float64Array(sampleCount);
  for (let i = 0; i < sampleCount; i++) timesNd[i] = (durationNd * i) / (sampleCount - 1);
  return sampleTrajectoryAt(mu, state0, timesNd, tolerance);
}

/**
 * Samples at given times: timesNd[0] = 0, then strictly monotonic (all forward or all backward), at least
 * two. The last sample is the integrator's own end point, not an interpolation.
 */
export function sampleTrajectoryAt(
  mu: number, state0: ArrayLike<number>, timesNd: Float64Array,
  tolerance: Tolerance = DEFAULT_TOLERANCE,
): TrajectorySamples {
  assertMassRatio(mu);
  if (state0.length !== 6) throw new RangeError(`state0 must have 6 numbers, got ${state0.length}`);
  const count = timesNd.length;
  if (count < 2 || timesNd[0] !== 0) throw new RangeError(`timesNd must start at 0 and hold at least 2 times, got ${count}`);
  const direction = Math.sign(timesNd[1]);
  for (let i = 1; i < count; i++) {
    if (!Number.isFinite(timesNd[i]) || Math.sign(timesNd[i] - timesNd[i - 1]) !== direction || direction === 0) {
      throw new RangeError(`timesNd must be finite and strictly monotonic, got ${timesNd[i]} after ${timesNd[i - 1]}`);
    }
  }
  const states = new Float64Array(6 * count);
  for (let i = 0; i < 6; i++) states[i] = state0[i];
  const samples = { timesNd, states };
  const ws = workspaceFor(6);
  const sampler = new Sampler(samples, count);
  integrateDop853(spatialEquations(mu), ws, 0, state0, timesNd[count - 1], { ...tolerance, dense: true }, sampler);
  for (let i = 0; i < 6; i++) states[6 * (count - 1) + i] = ws.y[i];
  return samples;
}
