// ẋ at the k-th crossing of y = 0 from the perpendicular start (x0, 0, 0, ẏ0): the residual whose roots are
// symmetric periodic orbits (mirror theorem, Roy & Ovenden 1955), with the earlier crossings' ẋ (a zero
// among them marks a multiple cover of a shorter orbit).
import { yAxisCrossing } from '../events/y-axis-crossing.ts';
import { propagate } from '../propagation/propagate.ts';

export interface ResidualOptions {
  rtol: number;
  atol: number;
  maxHalfTimeNd: number;
  /** Closer than this to a primary's centre counts as a collision (the crossing is not reached). */
  collisionRadiusNd: number;
}

export interface HalfCrossing {
  vx: number;
  tNd: number;
  earlierVx: number[];
}

/** NaN fields when the k-th crossing is not reached (collision, time limit); throws on other failures. */
export function halfCrossingResidual(mu: number, x0: number, vy0: number, k: number, o: ResidualOptions): HalfCrossing {
  const run = propagate(mu, [x0, 0, 0, vy0], o.maxHalfTimeNd, {
    rtol: o.rtol, atol: o.atol, events: [yAxisCrossing({ terminalCount: k })], collisionRadiusNd: o.collisionRadiusNd,
  });
  if (run.events.length < k) return { vx: NaN, tNd: NaN, earlierVx: [] };
  const last = run.events[k - 1]!;
  return { vx: last.state[3]!, tNd: last.tNd, earlierVx: run.events.slice(0, k - 1).map((e) => e.state[3]!) };
}
