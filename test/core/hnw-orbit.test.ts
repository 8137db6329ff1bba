// DOP853 on the Hairer–Nørsett–Wanner periodic orbit (Solving ODEs I, 1993, §II.0; values in DESIGN.md).
import { describe, expect, it } from 'vitest';
import { propagate } from '../../generator/core/index.ts';
import { HNW_MU, HNW_PERIOD, HNW_STATE_PLANAR, HNW_STATE_SPATIAL, maxAbsDifference } from './hnw-orbit.ts';

function closureError(tolerance: number): { error: number; rhsEvaluations: number } {
  const run = propagate(HNW_MU, HNW_STATE_PLANAR, HNW_PERIOD, { rtol: tolerance, atol: tolerance });
  return { error: maxAbsDifference(run.state, HNW_STATE_PLANAR), rhsEvaluations: run.rhsEvaluations };
}

describe('HNW test orbit', () => {
  it('closes after one period to 1e-9 at tolerance 1e-12', () => {
    // DESIGN.md: "a good integrator closes it to ~1e-9 or better at tolerance 1e-12" (HNW 1993, §II.0).
    expect(closureError(1e-12).error).toBeLessThanOrEqual(1e-9);
  });

  it('closes the same in the spatial equations (z = vz = 0 stay zero)', () => {
    // Same orbit, same source; the planar orbit is an invariant subspace of the spatial problem (common practice).
    const run = propagate(HNW_MU, HNW_STATE_SPATIAL, HNW_PERIOD, { rtol: 1e-12, atol: 1e-12 });
    expect(maxAbsDifference(run.state, HNW_STATE_SPATIAL)).toBeLessThanOrEqual(1e-9);
    expect(run.state[2]).toBe(0);
    expect(run.state[5]).toBe(0);
  });

  it('error shrinks at least 10x per 100x tighter tolerance (1e-6 → 1e-8 → 1e-10)', () => {
    // Tolerance proportionality of an error-per-step controller (HNW 1993, §II.4): the global error follows
    // the tolerance roughly linearly, so 100x tighter should give far more than 10x smaller.
    const errors = [1e-6, 1e-8, 1e-10].map((tol) => closureError(tol).error);
    expect(errors[1]).toBeLessThanOrEqual(errors[0] / 10);
    expect(errors[2]).toBeLessThanOrEqual(errors[1] / 10);
  });

  it('shows 8th order: error against work falls like (RHS evaluations)^-8', () => {
    // For an order-p method the error behaves like C·(work)^-p (HNW 1993, §II.4, work–precision diagrams);
    // DOP853 is of order 8. The slope between tolerances 1e-6 and 1e-10 must be clearly above 6.
    const loose = closureError(1e-6);
    const tight = closureError(1e-10);
    const slope = Math.log(loose.error / tight.error) / Math.log(tight.rhsEvaluations / loose.rhsEvaluations);
    expect(slope).toBeGreaterThan(6.5);
    expect(slope).toBeLessThan(12);
  });
});
