// Propagation of a 6-state under any rotating-frame model (CR3BP, bicircular, elliptic) with an
// AxisCrossingWatch: the composition propagation/propagate.ts makes for the CR3BP alone. (A propagate variant
// that takes an Rhs would let the two share this; see the report.)
import { IntegrationError, integrateDop853, type Rhs } from '../dop853/index.ts';
import { workspaceFor } from '../propagation/workspace-cache.ts';
import type { AxisCrossingWatch, WatchStop } from './axis-crossing-watch.ts';

export interface RunTolerance {
  rtol: number;
  atol: number;
  maxSteps?: number;
}

export interface RunOutcome {
  tFinalNd: number;
  /** 'end': reached tEnd; a WatchStop: the watch stopped it; 'integration-error': step-size collapse or step limit. */
  stop: Exclude<WatchStop, null> | 'end' | 'integration-error';
}

export function runWithAxisCrossings(
  rhs: Rhs, state0: ArrayLike<number>, t0Nd: number, tEndNd: number, tolerance: RunTolerance, watch: AxisCrossingWatch,
  firstDeadlineNd = Infinity,
): RunOutcome {
  if (state0.length !== 6) throw new RangeError(`state0 must have 6 numbers, got ${state0.length}`);
  const ws = workspaceFor(6);
  watch.start(state0, firstDeadlineNd);
  try {
    const run = integrateDop853(rhs, ws, t0Nd, state0, tEndNd, {
      rtol: tolerance.rtol, atol: tolerance.atol, maxSteps: tolerance.maxSteps, dense: true,
    }, watch);
    return { tFinalNd: run.tFinal, stop: run.stoppedByObserver && watch.stop ? watch.stop : 'end' };
  } catch (error) {
    if (error instanceof IntegrationError) return { tFinalNd: error.timeNd, stop: 'integration-error' };
    throw error;
  }
}
