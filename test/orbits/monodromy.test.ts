// The stored 6×6 monodromy of every generated orbit: symplectic in the rotating-frame (r, v) form, its
// eigenvalues (from ml-matrix, an independent library) in reciprocal pairs with two at 1, equal to the stored
// eigenvalues, and its in-plane index equal to the one from a separate 4×4 planar propagation.
// Outside sources: Meyer, Hall & Offin (Introduction to Hamiltonian Dynamical Systems, ch. 2–3) for the
// symplectic monodromy and its reciprocal eigenvalue pairs; the pair at 1 from the flow direction and the
// Jacobi integral of a periodic orbit (Szebehely 1967, ch. 10; Hénon 1973, A&A 28); ml-matrix for eigenvalues.
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { beforeAll, describe, expect, it } from 'vitest';
import type { FamilyBundle, OrbitRow } from '../../catalog-db/types.ts';
import { propagate } from '../../generator/core/propagation/propagate.ts';
import { E1M1_JOB, EARTH_MOON, LYAPUNOV_JOB, jobResult } from './helpers/earth-moon-jobs.ts';
import { independentIndices } from './helpers/independent-analysis.ts';
import { canonicalForm, maxAbs, rotatingFrameForm, rowMajorToMatrix, symplecticDefect } from './helpers/symplectic-form.ts';

const mu = EARTH_MOON.mu;
type Complex = [number, number];

function eigenvaluesOf(orbit: OrbitRow): Complex[] {
  const e = new EigenvalueDecomposition(new Matrix(rowMajorToMatrix(orbit.monodromy)));
  return e.realEigenvalues.map((re, i) => [re, e.imaginaryEigenvalues[i]]);
}

const times = (a: Complex, b: Complex): Complex => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
const distance = (a: Complex, b: Complex) => Math.hypot(a[0] - b[0], a[1] - b[1]);

/** Nearness of an index to ±1, where eigenvalue pairs meet and eigenvalues lose half their digits. */
const nearCollision = (o: OrbitRow) =>
  Math.min(...[o.stabilityIndex, o.verticalStabilityIndex].map((v) => Math.min(Math.abs(v - 1), Math.abs(v + 1))));

describe.each([
  ['L1 Lyapunov', LYAPUNOV_JOB],
  ['E1M1', E1M1_JOB],
])('monodromy of the %s family', (_label, job) => {
  let family: FamilyBundle;
  beforeAll(() => {
    family = jobResult(job).bundles[0];
  });

  it('is symplectic for the rotating-frame form [[2S, I], [−I, 0]], and not for the canonical J', () => {
    for (const orbit of family.orbits) {
      const m = rowMajorToMatrix(orbit.monodromy);
      const scale = maxAbs(m) ** 2; // Mᵀ F M sums products of two entries
      // Round-off and integration error ~1e-12 per entry relative to the largest products (common practice).
      expect(symplecticDefect(m, rotatingFrameForm()) / scale, orbit.id).toBeLessThan(1e-11);
      // The (r, v) coordinates are not canonical: the plain J must fail by far (guards the check above).
      expect(symplecticDefect(m, canonicalForm()) / scale, orbit.id).toBeGreaterThan(1e-6);
    }
  });

  it('decouples the plane from the vertical (z, vz) block for a planar orbit', () => {
    for (const orbit of family.orbits) {
      const m = rowMajorToMatrix(orbit.monodromy);
      for (const i of [0, 1, 3, 4]) {
        for (const j of [2, 5]) {
          expect(Math.abs(m[i][j])).toBeLessThanOrEqual(1e-12);
          expect(Math.abs(m[j][i])).toBeLessThanOrEqual(1e-12);
        }
      }
    }
  });

  it('has its eigenvalues (ml-matrix) in reciprocal pairs, two of them at 1', () => {
    for (const orbit of family.orbits) {
      const values = eigenvaluesOf(orbit);
      expect(values).toHaveLength(6);
      for (let i = 0; i < 6; i++) {
        // Some other eigenvalue μ with λ·μ = 1 (λ and 1/λ, or a conjugate pair on the unit circle).
        const bestProduct = Math.min(...values.filter((_, k) => k !== i).map((v) => distance(times(values[i], v), [1, 0])));
        expect(bestProduct, `${orbit.id}: λ = ${values[i]}`).toBeLessThan(1e-7);
      }
      // The trivial pair at 1 is a Jordan block (flow direction, change of C along the family), so
      // round-off ε splits it by ~√ε·‖M‖ (Wilkinson 1965, The Algebraic Eigenvalue Problem, ch. 2): allow 3e-3.
      const fromOne = values.map((v) => distance(v, [1, 0])).sort((a, b) => a - b);
      expect(fromOne[1], orbit.id).toBeLessThan(3e-3);
    }
  });

  it('has the stored eigenvalues (eigenvaluePair of the stored indices) among the ml-matrix ones', () => {
    let compared = 0;
    for (const orbit of family.orbits) {
      expect(orbit.eigenvalues).toHaveLength(4);
      // Where an index is within 1e-3 of ±1 two pairs meet, eigenvalues are only good to √ε there; the
      // index itself stays well conditioned and is checked against independent propagations below.
      if (nearCollision(orbit) < 1e-3) continue;
      compared++;
      const values = eigenvaluesOf(orbit);
      for (const stored of orbit.eigenvalues) {
        const nearest = Math.min(...values.map((v) => distance(v, stored)));
        expect(nearest / Math.max(1, Math.hypot(...stored)), `${orbit.id}: stored ${stored}`).toBeLessThan(1e-6);
      }
    }
    expect(compared).toBeGreaterThan(family.orbits.length / 2);
  });

  it('gives the in-plane index of a separate 4×4 planar propagation with the planar STM', () => {
    for (const orbit of family.orbits) {
      const run = propagate(mu, [orbit.state0[0], 0, 0, orbit.state0[4]], orbit.period, { stm: true, rtol: 1e-12, atol: 1e-12 });
      const m4 = run.stm!;
      const planar = (m4[0] + m4[5] + m4[10] + m4[15] - 2) / 2;
      expect(Math.abs(planar - orbit.stabilityIndex) / Math.max(1, Math.abs(orbit.stabilityIndex)), orbit.id).toBeLessThan(1e-6);
    }
  });

  it('equals the monodromy of an independent integration (odex, own variational equations)', () => {
    for (const orbit of family.orbits) {
      const independent = independentIndices(mu, orbit);
      const scale = Math.max(1, ...orbit.monodromy.map(Math.abs));
      const worst = Math.max(...orbit.monodromy.map((v, k) => Math.abs(v - independent.monodromy[k])));
      expect(worst / scale, orbit.id).toBeLessThan(1e-6);
      expect(Math.abs(independent.inPlane - orbit.stabilityIndex) / Math.max(1, Math.abs(orbit.stabilityIndex)), orbit.id).toBeLessThan(1e-6);
      expect(Math.abs(independent.vertical - orbit.verticalStabilityIndex), orbit.id).toBeLessThan(1e-6);
    }
  });
});
