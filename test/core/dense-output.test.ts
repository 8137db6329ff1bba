// DOP853's 7th-order continuous extension (HNW 1993, §II.6) and sampleTrajectory, on the HNW orbit (§II.0).
import { describe, expect, it } from 'vitest';
import {
  createDop853Workspace, evaluateDenseOutput, integrateDop853, planarEquations, propagate, sampleTrajectory,
  type StepObserver,
} from '../../generator/core/index.ts';
import { HNW_MU, HNW_PERIOD, HNW_STATE_PLANAR, HNW_STATE_SPATIAL, maxAbsDifference } from './hnw-orbit.ts';

describe('dense output', () => {
  it("reproduces the integrator's own states at both ends of every step", () => {
    // The interpolant is built to pass through y(t_old) and y(t_new) (HNW 1993, §II.6: continuous extension).
    const ws = createDop853Workspace(4);
    let previous = Float64Array.from(HNW_STATE_PLANAR);
    let worstStart = 0;
    let worstEnd = 0;
    let steps = 0;
    const out = new Float64Array(4);
    const observer: StepObserver = {
      afterStep(w, tOld, tNew) {
        evaluateDenseOutput(w, tOld, out);
        worstStart = Math.max(worstStart, maxAbsDifference(out, previous));
        evaluateDenseOutput(w, tNew, out);
        worstEnd = Math.max(worstEnd, maxAbsDifference(out, w.y));
        previous = w.y.slice();
        steps++;
        return NaN;
      },
    };
    integrateDop853(planarEquations(HNW_MU), ws, 0, HNW_STATE_PLANAR, HNW_PERIOD, { rtol: 1e-12, atol: 1e-12, dense: true }, observer);
    expect(steps).toBeGreaterThan(100);
    expect(worstStart).toBe(0); // s = 0 exactly: the stored start state
    // s = (t_new − t_old)/h is 1 only up to the rounding of t_old + h (ulp(17) ≈ 4e-15), times |y'| ≤ ~100.
    expect(worstEnd).toBeLessThanOrEqual(1e-12);
  });

  it('agrees inside the steps with integrations restarted to those times (to 1e-9)', () => {
    const ws = createDop853Workspace(4);
    const probes: { t: number; state: Float64Array }[] = [];
    const observer: StepObserver = {
      afterStep(w, tOld, tNew) {
        if (probes.length < 40 && w.y[0] < 0.9) { // away from the close lunar passage at the ends
          const state = new Float64Array(4);
          const t = tOld + 0.37 * (tNew - tOld);
          evaluateDenseOutput(w, t, state);
          probes.push({ t, state });
        }
        return NaN;
      },
    };
    integrateDop853(planarEquations(HNW_MU), ws, 0, HNW_STATE_PLANAR, HNW_PERIOD, { rtol: 1e-12, atol: 1e-12, dense: true }, observer);
    expect(probes.length).toBe(40);
    for (const { t, state } of probes) {
      const restarted = propagate(HNW_MU, HNW_STATE_PLANAR, t, { rtol: 1e-13, atol: 1e-13 }).state;
      expect(maxAbsDifference(state, restarted), `t = ${t}`).toBeLessThanOrEqual(1e-9);
    }
  });
});

describe('sampleTrajectory', () => {
  const count = 201; // odd: the middle sample falls on T/2
  const samples = sampleTrajectory(HNW_MU, HNW_STATE_SPATIAL, HNW_PERIOD, count, { rtol: 1e-13, atol: 1e-13 });
  const state = (i: number) => samples.states.subarray(6 * i, 6 * i + 6);

  it('is evenly spaced from 0 to the end and starts at the initial state', () => {
    expect(samples.timesNd[0]).toBe(0);
    expect(samples.timesNd[count - 1]).toBeCloseTo(HNW_PERIOD, 14);
    expect(samples.timesNd[1] - samples.timesNd[0]).toBeCloseTo(HNW_PERIOD / (count - 1), 14);
    expect(Array.from(state(0))).toEqual(Array.from(HNW_STATE_SPATIAL));
  });

  it('is mirror-symmetric about T/2: (x, −y, −vx, vy) at T/2 ± τ (Roy & Ovenden 1955 mirror theorem)', () => {
    // The HNW orbit starts perpendicular on the x-axis, so its halves are mirror images (DESIGN.md).
    const half = (count - 1) / 2;
    const middle = state(half);
    expect(Math.abs(middle[1])).toBeLessThanOrEqual(1e-9); // on the x-axis at T/2 ...
    expect(Math.abs(middle[3])).toBeLessThanOrEqual(1e-9); // ... crossing it perpendicularly
    let worst = 0;
    for (let k = 1; k <= half; k++) {
      const before = state(half - k);
      const after = state(half + k);
      const mirrored = [before[0], -before[1], before[2], -before[3], before[4], -before[5]];
      worst = Math.max(worst, maxAbsDifference(after, mirrored));
    }
    expect(worst).toBeLessThanOrEqual(1e-8);
  });

  it("ends at the integrator's own end point, not an interpolation", () => {
    const run = propagate(HNW_MU, HNW_STATE_SPATIAL, HNW_PERIOD, { rtol: 1e-13, atol: 1e-13 });
    expect(Array.from(state(count - 1))).toEqual(Array.from(run.state));
    expect(maxAbsDifference(state(count - 1), HNW_STATE_SPATIAL)).toBeLessThanOrEqual(2e-9); // closes (HNW §II.0)
  });
});
