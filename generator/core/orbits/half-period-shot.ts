// One shot of the symmetric-orbit corrector: from the perpendicular start (x0, 0, 0, 0, vy0, 0) to the
// k-th crossing of y = 0, with the planar STM (mirror theorem, Roy & Ovenden 1955; Howell 1984).
import { propagate } from '../propagation/propagate.ts';
import { IntegrationError } from '../dop853/index.ts';
import { yAxisCrossing } from '../events/y-axis-crossing.ts';
import type { EventSpec } from '../events/event-spec.ts';

export interface HalfPeriodShot {
  tHalfNd: number;
  /** Planar state x, y, vx, vy at the crossing. */
  state: Float64Array;
  /** Planar STM at the crossing, row-major 4×4. */
  stm: Float64Array;
  /** ẍ at the crossing (for the crossing-time correction). */
  axAtCrossing: number;
  /** vx at every earlier crossing (a multiple cover shows as a zero among them). */
  earlierVx: number[];
}

export interface ShotOptions {
  rtol: number;
  atol: number;
  /** Give up (throw) past this time: the crossing was not reached. */
  maxTimeNd: number;
}

const crossingCache = new Map<number, EventSpec[]>();

function crossingEvents(halfCrossings: number): EventSpec[] {
  let events = crossingCache.get(halfCrossings);
  if (!events) {
    events = [yAxisCrossing({ terminalCount: halfCrossings })];
    crossingCache.set(halfCrossings, events);
  }
  return events;
}

/** Null when the crossing is not reached: time limit, or a trajectory into a body (a Newton iterate can stray there). */
export function halfPeriodShot(mu: number, x0: number, vy0: number, halfCrossings: number, options: ShotOptions): HalfPeriodShot | null {
  let result;
  try {
    result = propagate(mu, [x0, 0, 0, vy0], options.maxTimeNd, {
      rtol: options.rtol, atol: options.atol, stm: true, events: crossingEvents(halfCrossings),
    });
  } catch (error) {
    if (error instanceof IntegrationError) return null;
    throw error;
  }
  if (!result.terminated) return null;
  const hits = result.events;
  const last = hits[hits.length - 1];
  const v = last.vector;
  const x = v[0], y = v[1], vy = v[3];
  const r1 = Math.hypot(x + mu, y), r2 = Math.hypot(x - 1 + mu, y);
  const ax = x + 2 * vy - ((1 - mu) * (x + mu)) / r1 ** 3 - (mu * (x - 1 + mu)) / r2 ** 3;
  return {
    tHalfNd: last.tNd,
    state: v.slice(0, 4),
    stm: v.slice(4, 20),
    axAtCrossing: ax,
    earlierVx: hits.slice(0, -1).map((h) => h.state[3]),
  };
}

/**
 * Gradient of vx at the crossing with respect to (x0, vy0), with the crossing time free (Howell 1984):
 * d vx = (Φ_vx,· − ẍ / ẏ · Φ_y,·) d(state0).
 */
export function crossingVxGradient(shot: HalfPeriodShot): [number, number] {
  const phi = shot.stm;
  const vy = shot.state[3];
  const ratio = shot.axAtCrossing / vy;
  // Rows: 0 x, 1 y, 2 vx, 3 vy; columns x0 (0) and vy0 (3).
  return [phi[8] - ratio * phi[4], phi[11] - ratio * phi[7]];
}
