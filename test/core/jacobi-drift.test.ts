// The Jacobi constant C = x² + y² + 2(1−μ)/r₁ + 2μ/r₂ − v² is conserved by the CR3BP flow (Szebehely 1967,
// ch. 1; DESIGN.md convention), so its drift measures the integrator's error over long runs.
import { describe, expect, it } from 'vitest';
import {
  createDop853Workspace, integrateDop853, jacobiConstant, lagrangePoints, spatialEquations, type StepObserver,
} from '../../generator/core/index.ts';

const MU = 0.0121505842695; // Earth–Moon, DESIGN.md
const DURATION = 100;
const TOLERANCE = 1e-13;

/** Largest |C(t) − C(0)| over every accepted step of one run. */
function maxJacobiDrift(state0: number[]): number {
  const c0 = jacobiConstant(MU, state0);
  let worst = 0;
  const watch: StepObserver = {
    afterStep(ws) {
      worst = Math.max(worst, Math.abs(jacobiConstant(MU, ws.y) - c0));
      return NaN;
    },
  };
  const ws = createDop853Workspace(6);
  integrateDop853(spatialEquations(MU), ws, 0, state0, DURATION, { rtol: TOLERANCE, atol: TOLERANCE }, watch);
  return worst;
}

/** Circular about one body in the inertial frame, written in the rotating frame (v_rot = v_in − ω × r). */
function circularAbout(xBody: number, gm: number, radius: number, inclination: number): number[] {
  const speed = Math.sqrt(gm / radius);
  const x = xBody + radius;
  return [x, 0, 0, 0, speed * Math.cos(inclination) + xBody - x, speed * Math.sin(inclination)];
}

describe('Jacobi constant over 100 time units at tolerance 1e-13', () => {
  const cL1 = lagrangePoints(MU)[0].jacobi;

  it('drifts at most 1e-11 on an Earth-bound orbit (radius 0.25, about 96,000 km)', () => {
    const state0 = circularAbout(-MU, 1 - MU, 0.25, 0.2);
    expect(jacobiConstant(MU, state0)).toBeGreaterThan(cL1); // energy below L1: stays about the Earth
    expect(maxJacobiDrift(state0)).toBeLessThanOrEqual(1e-11);
  });

  it('stays small on a low Moon-bound orbit too (300 revolutions, drift grows with the step count)', () => {
    // Same conservation law; ~13,500 steps instead of ~6,200, so the bound is five times the one above.
    const state0 = circularAbout(1 - MU, MU, 0.03, 0.3);
    expect(jacobiConstant(MU, state0)).toBeGreaterThan(cL1);
    expect(maxJacobiDrift(state0)).toBeLessThanOrEqual(5e-11);
  });
});
