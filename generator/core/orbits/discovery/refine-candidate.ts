// From a root edge of the zero set to a root at the loose tolerance: Brent along the edge (along x0 at
// fixed C, or along C at fixed x0), rejecting jumps and multiple covers, as the start of a Newton correction.
import { axisSpeedSquared } from '../../cr3bp/axis-speed-squared.ts';
import { findRootBrent } from '../../events/find-root-brent.ts';
import { halfCrossingResidual, type ResidualOptions } from '../half-crossing-residual.ts';
import type { ZeroCandidate } from './zero-candidate.ts';

export interface RefinedRoot {
  x0: number;
  vy0: number;
  jacobi: number;
  tHalfNd: number;
}

/** |ẋ| at the refined root below this: a true root, not a sign change across a jump. */
const ROOT_RESIDUAL = 1e-4;
/** An earlier crossing this close to perpendicular makes the orbit a multiple cover. */
const EARLIER_PERPENDICULAR = 1e-6;

export function refineCandidate(mu: number, c: ZeroCandidate, o: ResidualOptions): RefinedRoot | null {
  const startAt = (u: number): [number, number, number] => {
    const x0 = c.along === 'x' ? u : c.x0A;
    const jacobi = c.along === 'x' ? c.jacobiA : u;
    return [x0, c.direction * Math.sqrt(Math.max(0, axisSpeedSquared(mu, x0, jacobi))), jacobi];
  };
  const residual = (u: number) => {
    const [x0, vy0] = startAt(u);
    const r = halfCrossingResidual(mu, x0, vy0, c.halfCrossings, o);
    if (!Number.isFinite(r.vx)) throw new Error('crossing lost');
    return r.vx;
  };
  const [a, b] = c.along === 'x' ? [c.x0A, c.x0B] : [c.jacobiA, c.jacobiB];
  let u: number;
  try {
    u = findRootBrent(residual, a, b, c.vxA, c.vxB, 1e-13 * Math.max(1, Math.abs(a)), 100 * o.rtol);
  } catch {
    return null;
  }
  const [x0, vy0, jacobi] = startAt(u);
  const check = halfCrossingResidual(mu, x0, vy0, c.halfCrossings, o);
  if (!(Math.abs(check.vx) < ROOT_RESIDUAL)) return null;
  if (check.earlierVx.some((vx) => Math.abs(vx) < EARLIER_PERPENDICULAR)) return null;
  return { x0, vy0, jacobi, tHalfNd: check.tNd };
}
