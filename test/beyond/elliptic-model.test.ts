// Elliptic restricted three-body problem in pulsating coordinates with the true anomaly as independent
// variable (Szebehely 1967, ch. 10). Checks: the e = 0 limit is the CR3BP exactly; and the equations against
// an independent formulation — the particle in barycentric inertial axes, the primaries on Kepler ellipses,
// time from Kepler's equation, integrated by odex (an npm reference library) — for a spatial start, so the
// −e z cos f term is exercised too. Lunar e = 0.0549 (common practice).
import { Solver } from 'odex';
import { describe, expect, it } from 'vitest';
import { ellipticEquations, ellipticInitialState, LUNAR_ECCENTRICITY } from '../../generator/core/beyond/index.ts';
import { createDop853Workspace, integrateDop853 } from '../../generator/core/dop853/index.ts';
import { propagate } from '../../generator/core/propagation/propagate.ts';
import { MU } from './helpers/earth-moon-orbits.ts';

function runElliptic(e: number, y0: ArrayLike<number>, f0: number, f1: number, tol = 1e-12): Float64Array {
  const ws = createDop853Workspace(6);
  integrateDop853(ellipticEquations(MU, e), ws, f0, y0, f1, { rtol: tol, atol: tol });
  return ws.y.slice();
}

describe('elliptic model', () => {
  it('uses the common lunar eccentricity 0.0549', () => {
    expect(LUNAR_ECCENTRICITY).toBe(0.0549); // common practice (mean lunar eccentricity)
  });

  it('reproduces the CR3BP propagation exactly with e = 0 (to 1e-12), whatever the start anomaly', () => {
    const s0 = [-0.7945862335775753, 0, 0, 0, -0.3525100848470284, 0]; // an E1M1 start (helpers/earth-moon-orbits.ts)
    const duration = 14.290255065615174;
    const reference = propagate(MU, s0, duration, { rtol: 1e-12, atol: 1e-12 }).state;
    for (const f0 of [0, 2.5]) {
      const ours = runElliptic(0, s0, f0, f0 + duration);
      // f0 ≠ 0 shifts the step times, so round-off differs: 1e-12 is the bound asked, not bit equality.
      for (let k = 0; k < 6; k++) expect(Math.abs(ours[k] - reference[k])).toBeLessThanOrEqual(1e-12);
    }
  });

  it('agrees with the primaries on Kepler ellipses in inertial axes (odex), spatial start, e = 0.0549', () => {
    const e = LUNAR_ECCENTRICITY;
    // Units: semi-major axis 1, G(m1 + m2) = 1, mean motion 1; r(f) = (1 − e²)/(1 + e cos f), ḟ = √(1 − e²)/r².
    const radius = (f: number) => (1 - e * e) / (1 + e * Math.cos(f));
    const radiusRate = (f: number) => ((1 - e * e) * e * Math.sin(f)) / (1 + e * Math.cos(f)) ** 2; // dr/df
    const anomalyRate = (f: number) => Math.sqrt(1 - e * e) / radius(f) ** 2;
    // Mean anomaly as a continuous function of f: E = f − 2 atan(β sin f/(1 + β cos f)), β = e/(1 + √(1 − e²)).
    const beta = e / (1 + Math.sqrt(1 - e * e));
    const meanAnomaly = (f: number) => {
      const E = f - 2 * Math.atan((beta * Math.sin(f)) / (1 + beta * Math.cos(f)));
      return E - e * Math.sin(E);
    };
    const toInertial = (f: number, s: readonly number[]): number[] => {
      const r = radius(f), dr = radiusRate(f), fd = anomalyRate(f), c = Math.cos(f), sn = Math.sin(f);
      const [x, y, z, vx, vy, vz] = s;
      // d/df of r R(f) ξ = r' R ξ + r R (K ξ + ξ'), K ξ = (−y, x, 0).
      const wx = dr * x + r * (vx - y), wy = dr * y + r * (vy + x), wz = dr * z + r * vz;
      return [r * (c * x - sn * y), r * (sn * x + c * y), r * z, fd * (c * wx - sn * wy), fd * (sn * wx + c * wy), fd * wz];
    };
    const fromInertial = (f: number, S: readonly number[]): number[] => {
      const r = radius(f), dr = radiusRate(f), fd = anomalyRate(f), c = Math.cos(f), sn = Math.sin(f);
      const [X, Y, Z, VX, VY, VZ] = S;
      const x = (c * X + sn * Y) / r, y = (-sn * X + c * Y) / r, z = Z / r;
      const wx = (c * VX + sn * VY) / fd, wy = (-sn * VX + c * VY) / fd, wz = VZ / fd;
      return [x, y, z, (wx - dr * x) / r + y, (wy - dr * y) / r - x, (wz - dr * z) / r];
    };
    const inertialRhs = (t: number, s: number[], f0: number, t0: number): number[] => {
      // Primaries' true anomaly at time t by Newton on Kepler's equation, then their positions.
      const M = meanAnomaly(f0) + (t - t0);
      let E = M;
      for (let i = 0; i < 30; i++) E -= (E - e * Math.sin(E) - M) / (1 - e * Math.cos(E));
      const f = 2 * Math.atan2(Math.sqrt(1 + e) * Math.sin(E / 2), Math.sqrt(1 - e) * Math.cos(E / 2));
      const r = radius(f), px = r * Math.cos(f), py = r * Math.sin(f);
      const [X, Y, Z, VX, VY, VZ] = s;
      const acc = [0, 0, 0];
      for (const [bx, by, gm] of [[-MU * px, -MU * py, 1 - MU], [(1 - MU) * px, (1 - MU) * py, MU]]) {
        const dx = X - bx, dy = Y - by, r3 = Math.hypot(dx, dy, Z) ** 3;
        acc[0] -= (gm * dx) / r3; acc[1] -= (gm * dy) / r3; acc[2] -= (gm * Z) / r3;
      }
      return [VX, VY, VZ, ...acc];
    };
    for (const [f0, s0] of [[0.4, [0.8, 0.05, 0.08, 0.05, 0.2, 0.03]], [3.5, [-0.6, 0.3, -0.1, 0.2, -0.5, 0.1]]] as const) {
      const f1 = f0 + 2.2;
      const t0 = meanAnomaly(f0), t1 = meanAnomaly(f1);
      const solver = new Solver(6);
      solver.absoluteTolerance = 1e-13;
      solver.relativeTolerance = 1e-13;
      solver.maxSteps = 1_000_000;
      const out = solver.solve((t: number, s: number[]) => inertialRhs(t, s, f0, t0), t0, toInertial(f0, s0), t1);
      expect(out.outcome).toBe(0);
      const expected = fromInertial(f1, out.y);
      const ours = runElliptic(e, s0, f0, f1);
      for (let k = 0; k < 6; k++) expect(Math.abs(ours[k] - expected[k]), `component ${k}, f0 = ${f0}`).toBeLessThan(1e-9);
      // And the round trip of the conversion itself.
      const back = fromInertial(f0, toInertial(f0, s0));
      for (let k = 0; k < 6; k++) expect(back[k]).toBeCloseTo(s0[k], 13);
    }
  });

  it('starts from the CR3BP numbers and states the physical scale factors of that choice', () => {
    const s0 = [0.8, 0, 0, 0, 0.3, 0];
    for (const f0 of [0, Math.PI / 2, Math.PI]) {
      const start = ellipticInitialState(s0, LUNAR_ECCENTRICITY, f0);
      expect(Array.from(start.stateNd)).toEqual(s0);
      expect(start.startAnomalyRad).toBe(f0);
    }
    // At perigee (f0 = 0) the primaries are a(1 − e) apart and the frame turns fastest, (1 + e)/√(1 − e²).
    const e = LUNAR_ECCENTRICITY;
    const perigee = ellipticInitialState(s0, e, 0);
    expect(perigee.distanceScale).toBeCloseTo(1 - e, 14);
    expect(perigee.velocityScale).toBeCloseTo(Math.sqrt((1 + e) / (1 - e)), 14);
    expect(ellipticInitialState(s0, 0, 1).velocityScale).toBe(1);
    expect(() => ellipticInitialState(s0, 1.2, 0)).toThrow(/eccentricity/);
    expect(() => ellipticEquations(MU, -0.1)).toThrow(/eccentricity/);
  });
});
