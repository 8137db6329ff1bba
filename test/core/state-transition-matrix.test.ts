// The state-transition matrix Φ(t) integrated with the variational equations (Φ' = A(t)Φ, Φ(0) = I).
// Checks: central finite differences of the flow (common practice), Liouville's theorem det Φ = 1 (the CR3BP
// vector field is divergence-free: tr A = 0), and the symplectic identity in the rotating frame.
//
// Which symplectic form: the CR3BP is Hamiltonian in canonical coordinates (r, p) with p = v + ω × r,
// ω = (0, 0, 1) (Szebehely 1967, ch. 1). With z = T w, w = (r, v), T = [[I, 0], [W, I]], W r = ω × r, the
// canonical Φ_c = T Φ T⁻¹ satisfies Φ_cᵀ J Φ_c = J, J = [[0, I], [−I, 0]]. Substituting gives
//   Φᵀ Ĵ Φ = Ĵ with Ĵ = Tᵀ J T = [[W − Wᵀ, I], [−I, 0]],   W − Wᵀ = [[0, −2, 0], [2, 0, 0], [0, 0, 0]]
// for Φ in our (r, v) coordinates (common practice; worked out here). We test Ĵ directly, and check that the
// plain J does NOT hold, so the test can tell the two apart.
import { determinant, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { propagate } from '../../generator/core/index.ts';

const MU = 0.0121505842695; // Earth–Moon, DESIGN.md
const TOLERANCE = 1e-13;
const DELTA = 1e-7; // finite-difference step: truncation ~δ², integration noise ~tol/δ (measured error ≤ 4e-8)

/** Circular about one body in the inertial frame, in the rotating frame (v_rot = v_in − ω × r). */
function circularAbout(xBody: number, gm: number, radius: number, inclination: number): number[] {
  const speed = Math.sqrt(gm / radius);
  const x = xBody + radius;
  return [x, 0, 0, 0, speed * Math.cos(inclination) + xBody - x, speed * Math.sin(inclination)];
}

const planar = (s: number[]) => [s[0], s[1], s[3], s[4]];
const earthOrbit = circularAbout(-MU, 1 - MU, 0.25, 0.3);
const moonOrbit = circularAbout(1 - MU, MU, 0.05, 0.2);
const CASES = [
  { name: 'spatial 6×6, Earth-bound, 3 time units', state0: earthOrbit, duration: 3 },
  { name: 'spatial 6×6, Moon-bound, 1 time unit', state0: moonOrbit, duration: 1 },
  { name: 'planar 4×4, Earth-bound, 3 time units', state0: planar(earthOrbit), duration: 3 },
  { name: 'planar 4×4, Moon-bound, 1 time unit', state0: planar(moonOrbit), duration: 1 },
];

function stmOf(state0: number[], duration: number): Matrix {
  const d = state0.length;
  const run = propagate(MU, state0, duration, { rtol: TOLERANCE, atol: TOLERANCE, stm: true });
  return Matrix.from1DArray(d, d, Array.from(run.stm!));
}

/** Ĵ of the rotating frame (see the header), or the canonical J when rotating = false. */
function symplecticForm(d: number, rotating: boolean): Matrix {
  const half = d / 2;
  const form = Matrix.zeros(d, d);
  for (let i = 0; i < half; i++) {
    form.set(i, half + i, 1);
    form.set(half + i, i, -1);
  }
  if (rotating) {
    form.set(0, 1, -2);
    form.set(1, 0, 2);
  }
  return form;
}

function maxAbs(m: Matrix): number {
  return Math.max(...m.to1DArray().map(Math.abs));
}

describe('state-transition matrix', () => {
  for (const { name, state0, duration } of CASES) {
    describe(name, () => {
      const phi = stmOf(state0, duration);
      const d = state0.length;

      it('matches central finite differences of the flow to 1e-6 relative', () => {
        const fd = Matrix.zeros(d, d);
        for (let j = 0; j < d; j++) {
          const plus = state0.slice();
          const minus = state0.slice();
          plus[j] += DELTA;
          minus[j] -= DELTA;
          const fPlus = propagate(MU, plus, duration, { rtol: TOLERANCE, atol: TOLERANCE }).state;
          const fMinus = propagate(MU, minus, duration, { rtol: TOLERANCE, atol: TOLERANCE }).state;
          for (let i = 0; i < d; i++) fd.set(i, j, (fPlus[i] - fMinus[i]) / (2 * DELTA));
        }
        expect(maxAbs(Matrix.sub(phi, fd)) / maxAbs(phi)).toBeLessThanOrEqual(1e-6);
        expect(maxAbs(phi)).toBeGreaterThan(10); // a non-trivial Φ, far from the identity
      });

      it('has det Φ = 1 to 1e-9 (Liouville)', () => {
        expect(Math.abs(determinant(phi) - 1)).toBeLessThanOrEqual(1e-9);
      });

      it('satisfies Φᵀ Ĵ Φ = Ĵ to 1e-9 with the rotating-frame form, and not with the canonical J', () => {
        const rotating = symplecticForm(d, true);
        expect(maxAbs(Matrix.sub(phi.transpose().mmul(rotating).mmul(phi), rotating))).toBeLessThanOrEqual(1e-9);
        const canonical = symplecticForm(d, false);
        expect(maxAbs(Matrix.sub(phi.transpose().mmul(canonical).mmul(phi), canonical))).toBeGreaterThan(1e-3);
      });
    });
  }
});
