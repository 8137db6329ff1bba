// Newton corrector for a symmetric periodic orbit in (x0, vy0) with one extra scalar constraint:
// the pseudo-arclength condition τ·(u − u_prev) = Δs (Keller 1977). The same routine with τ along a
// secant corrects on a hyperplane, which is what the window-edge bisection uses.
import { crossingVxGradient, halfPeriodShot, type HalfPeriodShot, type ShotOptions } from './half-period-shot.ts';

export interface CorrectedOrbit {
  x0: number;
  vy0: number;
  /** The crossing of y = 0 at T/2 (1 = the first after the start). */
  halfCrossings: number;
  shot: HalfPeriodShot;
  iterations: number;
}

export interface CorrectorOptions extends ShotOptions {
  /** |vx| at the half-period crossing regarded as zero. */
  residualTolerance: number;
  maxIterations: number;
}

/** Newton step at round-off size: for violently unstable orbits the residual cannot fall further. */
const STALL_STEP = 1e-13;

function converged(residual: number, stepNorm: number, iteration: number, options: CorrectorOptions): boolean {
  if (Math.abs(residual) < options.residualTolerance && stepNorm < 1e3 * options.residualTolerance) return true;
  return iteration > 1 && stepNorm < STALL_STEP && Math.abs(residual) < 50 * options.residualTolerance;
}

export function correctOnArc(
  mu: number, halfCrossings: number, from: readonly [number, number], tangent: readonly [number, number],
  stepNd: number, options: CorrectorOptions,
): CorrectedOrbit | null {
  let x0 = from[0] + stepNd * tangent[0];
  let vy0 = from[1] + stepNd * tangent[1];
  for (let iteration = 1; iteration <= options.maxIterations; iteration++) {
    const shot = halfPeriodShot(mu, x0, vy0, halfCrossings, options);
    if (!shot) return null;
    const residual = shot.state[2];
    const arc = tangent[0] * (x0 - from[0]) + tangent[1] * (vy0 - from[1]) - stepNd;
    const [g0, g1] = crossingVxGradient(shot);
    const det = g0 * tangent[1] - g1 * tangent[0];
    if (!Number.isFinite(det) || det === 0) return null;
    const dx = -(residual * tangent[1] - g1 * arc) / det;
    const dv = -(g0 * arc - residual * tangent[0]) / det;
    if (converged(residual, Math.hypot(dx, dv), iteration, options)) return { x0, vy0, halfCrossings, shot, iterations: iteration };
    x0 += dx;
    vy0 += dv;
    if (!Number.isFinite(x0) || !Number.isFinite(vy0)) return null;
  }
  return null;
}

/** Unit tangent of the family curve vx(x0, vy0) = 0 at a corrected orbit, oriented along `previous`. */
export function familyTangent(shot: HalfPeriodShot, previous?: readonly [number, number]): [number, number] {
  const [g0, g1] = crossingVxGradient(shot);
  const norm = Math.hypot(g0, g1);
  let t: [number, number] = [-g1 / norm, g0 / norm];
  if (previous && t[0] * previous[0] + t[1] * previous[1] < 0) t = [-t[0], -t[1]];
  return t;
}

/** Newton on vy0 alone, x0 fixed: turns a rough guess (linear theory, Kepler) into a periodic orbit. */
export function correctAtFixedX0(mu: number, halfCrossings: number, x0: number, vy0Guess: number, options: CorrectorOptions): CorrectedOrbit | null {
  let vy0 = vy0Guess;
  for (let iteration = 1; iteration <= options.maxIterations; iteration++) {
    const shot = halfPeriodShot(mu, x0, vy0, halfCrossings, options);
    if (!shot) return null;
    const residual = shot.state[2];
    const slope = crossingVxGradient(shot)[1];
    const dv = -residual / slope;
    if (converged(residual, Math.abs(dv), iteration, options)) return { x0, vy0, halfCrossings, shot, iterations: iteration };
    vy0 += Math.max(-0.1, Math.min(0.1, dv)); // damped: a bad guess should not fly off to another family
    if (!Number.isFinite(vy0)) return null;
  }
  return null;
}
