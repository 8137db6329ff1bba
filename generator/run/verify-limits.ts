// What `verify` accepts when it re-integrates a stored orbit over one period, given the run's
// tolerance tol = max(rtol, atol) and the orbit's largest monodromy eigenvalue modulus λ (≥ 1).
//
// - It integrates at tol / 100 (not below 1e-14), so that its own integration error stays well below
//   the limits: at the run's own tolerance a state-only re-integration of a long orbit with close
//   passes is itself off by ~1e-7, while the generator (whose step control includes the STM) is not.
// - closure |x(T) − x(0)| ≤ max(1e-8, 1e4 · tol) · λ. An error δ in the stored state grows along the
//   unstable direction to about λ·δ after one period, so no stored state of a strongly unstable orbit
//   (λ up to ~1e6 in the demo) can close to 1e-8; the test is "stored state consistent to ~1e-8
//   relative to the orbit's own sensitivity" (a wrong state or period of 1e-6 still fails it).
// - Jacobi drift |C(T) − C(0)| ≤ max(1e-9, 1e3 · tol): C is an integral of motion, so its drift
//   measures integration error only and does not grow with λ.
// At the usual tol = 1e-12: closure ≤ 1e-8 · λ, drift ≤ 1e-9, re-integration at 1e-14.
import type { Tolerance } from '../core/propagation/tolerance.ts';

export interface VerifyLimits {
  closure: number;
  jacobiDrift: number;
}

export function verifyToleranceFor(run: Tolerance): Tolerance {
  return { rtol: Math.max(run.rtol / 100, 1e-14), atol: Math.max(run.atol / 100, 1e-14) };
}

export function verifyLimitsFor(run: Tolerance, largestEigenvalueModulus: number): VerifyLimits {
  const tol = Math.max(run.rtol, run.atol);
  const growth = Number.isFinite(largestEigenvalueModulus) ? Math.max(1, largestEigenvalueModulus) : 1;
  return { closure: Math.max(1e-8, 1e4 * tol) * growth, jacobiDrift: Math.max(1e-9, 1e3 * tol) };
}

/** Largest |λ| among the stored non-unit eigenvalues ([re, im] pairs), at least 1. */
export function largestEigenvalueModulus(eigenvalues: ReadonlyArray<readonly [number, number]>): number {
  return eigenvalues.reduce((largest, [re, im]) => Math.max(largest, Math.hypot(re, im)), 1);
}

/** How closely a stored derived value (stability indices, largest |λ|, period in days) must match the
 *  re-integration's, relative to max(1, |value|). The indices come from a monodromy whose entries carry
 *  integration error growing with λ; on an Earth–Moon E2M1 catalog (|ν| up to ~1e6) the worst stored
 *  index was 3.6e-5 off its re-integration at 1e-14, so 1e-3 leaves room while a corrupted value
 *  (a sign, a digit, a 1e300) still fails. */
export const STORED_VALUE_RELATIVE_LIMIT = 1e-3;
