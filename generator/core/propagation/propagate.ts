// Propagation of a CR3BP state (planar: 4 numbers, spatial: 6), optionally with its state-transition
// matrix and with events, on DOP853.
import { planarEquations } from '../cr3bp/equations-planar.ts';
import { planarStmEquations } from '../cr3bp/equations-planar-stm.ts';
import { spatialEquations } from '../cr3bp/equations-spatial.ts';
import { spatialStmEquations } from '../cr3bp/equations-spatial-stm.ts';
import { assertMassRatio } from '../cr3bp/lagrange-points.ts';
import { IntegrationError, integrateDop853, type Rhs } from '../dop853/index.ts';
import type { EventHit, EventSpec } from '../events/event-spec.ts';
import { EventLocator, toSpatialState } from '../events/event-locator.ts';
import { CollisionWatch } from './collision-watch.ts';
import { distanceToPrimary, distanceToSecondary } from './primary-distances.ts';
import { workspaceFor } from './workspace-cache.ts';
import { DEFAULT_TOLERANCE } from './tolerance.ts';

export interface PropagateOptions {
  rtol?: number;
  atol?: number;
  /** Integrate the variational equations too (Φ(0) = I). */
  stm?: boolean;
  events?: readonly EventSpec[];
  maxSteps?: number;
  maxStepNd?: number;
  /** A trajectory closer than this to either primary's centre stops with a collision error (default 1e-9). */
  collisionRadiusNd?: number;
}

export interface PropagationResult {
  /** Final state, as many numbers as given (4 planar, 6 spatial). */
  state: Float64Array;
  /** Final STM, row-major (16 or 36 numbers), when asked. */
  stm: Float64Array | null;
  tFinalNd: number;
  /** True when a terminal event ended the run before the requested time. */
  terminated: boolean;
  events: EventHit[];
  rhsEvaluations: number;
  steps: number;
  rejectedSteps: number;
}

function equationsFor(mu: number, planar: boolean, stm: boolean): Rhs {
  if (planar) return stm ? planarStmEquations(mu) : planarEquations(mu);
  return stm ? spatialStmEquations(mu) : spatialEquations(mu);
}

export function propagate(mu: number, state0: ArrayLike<number>, durationNd: number, options: PropagateOptions = {}): PropagationResult {
  assertMassRatio(mu);
  const dim = state0.length;
  if (dim !== 4 && dim !== 6) throw new RangeError(`state must have 4 (planar) or 6 (spatial) numbers, got ${dim}`);
  const planar = dim === 4;
  const withStm = options.stm ?? false;
  const n = dim + (withStm ? dim * dim : 0);
  const ws = workspaceFor(n);
  const y0 = new Float64Array(n);
  for (let i = 0; i < dim; i++) y0[i] = state0[i];
  if (withStm) for (let i = 0; i < dim; i++) y0[dim + i * dim + i] = 1;

  const radiusNd = options.collisionRadiusNd ?? 1e-9;
  const start = toSpatialState(y0, planar, new Float64Array(6));
  if (distanceToPrimary(mu, start) < radiusNd || distanceToSecondary(mu, start) < radiusNd) {
    throw new RangeError('state must not lie on a primary (distance below the collision radius)');
  }
  const events = options.events ?? [];
  const locator = events.length > 0 ? new EventLocator(events, planar, n) : null;
  locator?.start(0, y0);
  const watch = new CollisionWatch(mu, planar, radiusNd, locator);
  const rhs = equationsFor(mu, planar, withStm);
  let run;
  try {
    run = integrateDop853(rhs, ws, 0, y0, durationNd, {
      rtol: options.rtol ?? DEFAULT_TOLERANCE.rtol,
      atol: options.atol ?? DEFAULT_TOLERANCE.atol,
      maxSteps: options.maxSteps,
      maxStep: options.maxStepNd,
      dense: locator !== null,
    }, watch);
  } catch (error) {
    // A step-size collapse next to a primary is a collision, say so.
    if (error instanceof IntegrationError && error.reason === 'step-underflow') {
      const s = toSpatialState(ws.y, planar, new Float64Array(6));
      if (Math.min(distanceToPrimary(mu, s), distanceToSecondary(mu, s)) < 1e-3) {
        throw new IntegrationError(`trajectory hits a primary near t = ${error.timeNd}`, 'collision', error.timeNd);
      }
    }
    throw error;
  }
  return {
    state: ws.y.slice(0, dim),
    stm: withStm ? ws.y.slice(dim, n) : null,
    tFinalNd: run.tFinal,
    terminated: run.stoppedByObserver,
    events: locator ? locator.hits.slice() : [],
    rhsEvaluations: run.rhsEvaluations,
    steps: run.steps,
    rejectedSteps: run.rejectedSteps,
  };
}
