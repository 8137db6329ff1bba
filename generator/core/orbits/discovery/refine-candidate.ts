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
    // To round-off in u (no early stop on a small residual): the seed then does not depend on the
    // path Brent took, so bit-level changes elsewhere do not move the family's members.
    u = findRootBrent(residual, a, b, c.vxA, c.vxB, 1e-14 * Math.max(1, Math.abs(a)));
  } catch {
    // The crossing is lost somewhere inside the edge (a tangency there): the interpolated root is still
    // a start for Newton, which the corrector decides on.
    const [x0, vy0, jacobi] = startAt(c.along === 'x' ? c.x0Guess : c.jacobiGuess);
    return vy0 !== 0 ? { x0, vy0, jacobi, tHalfNd: c.tHalfGuessNd } : null;
  }
  const [x0, vy0, jacobi] = startAt(u);
  const check = halfCrossingResidual(mu, x0, vy0, c.halfCrossings, o);
  if (check.earlierVx.some((vx) => Math.abs(vx) < EARLIER_PERPENDICULAR)) return null;
  // A residual left at the bracket's end is a jump or a root too steep for the loose tolerance: Newton
  // with the STM, at the job's tolerance, tells the two apart.
  return { x0, vy0, jacobi, tHalfNd: Number.isFinite(check.tNd) ? check.tNd : c.tHalfGuessNd };
}
