// Equilibrium points and the linear in-plane period near L1/L2, against DESIGN.md's table
// (Szebehely 1967, ch. 4, for the points; Richardson 1980, Celest. Mech. 22, for the period formula).
import { describe, expect, it } from 'vitest';
import {
  findSystemPreset, jacobiConstant, lagrangePoints, massRatioOf, propagate, timeUnitSecondsOf,
  yAxisCrossing,
} from '../../generator/core/index.ts';
import { linearPlanarPeriod } from '../helpers/linear-planar-period.ts';

const MU = 0.0121505842695; // Earth–Moon, DESIGN.md (from the JPL DE430 GMs)
const TIME_UNIT_DAYS = 375190.262 / 86400; // DESIGN.md

function pointsByName(mu: number) {
  return Object.fromEntries(lagrangePoints(mu).map((p) => [p.name, p]));
}

/** ∂Ω/∂x and ∂Ω/∂y at a point of the plane (Szebehely 1967, ch. 1). */
function potentialGradient(mu: number, x: number, y: number): [number, number] {
  const r1 = Math.hypot(x + mu, y);
  const r2 = Math.hypot(x - 1 + mu, y);
  const k1 = (1 - mu) / r1 ** 3;
  const k2 = mu / r2 ** 3;
  return [x - k1 * (x + mu) - k2 * (x - 1 + mu), y - (k1 + k2) * y];
}

describe('Lagrange points, Earth–Moon', () => {
  const L = pointsByName(MU);

  it('places L1, L2, L3 as in DESIGN.md (quintic roots; Szebehely tabulates 0.8369, 1.1557, -1.0051)', () => {
    expect(L.L1.x).toBeCloseTo(0.836915132, 8);
    expect(L.L2.x).toBeCloseTo(1.15568216, 8);
    expect(L.L3.x).toBeCloseTo(-1.005062645, 8);
  });

  it('gives their Jacobi constants as in DESIGN.md', () => {
    expect(L.L1.jacobi).toBeCloseTo(3.188341105, 8);
    expect(L.L2.jacobi).toBeCloseTo(3.17216045, 8);
    expect(L.L3.jacobi).toBeCloseTo(3.012147149, 8);
    expect(L.L4.jacobi).toBeCloseTo(2.987997052, 8);
    expect(L.L5.jacobi).toBeCloseTo(2.987997052, 8);
  });

  it('puts L4/L5 at the equilateral points with C = 3 − μ(1 − μ) (Szebehely 1967, ch. 4)', () => {
    for (const p of [L.L4, L.L5]) {
      expect(Math.hypot(p.x + MU, p.y)).toBeCloseTo(1, 14);
      expect(Math.hypot(p.x - 1 + MU, p.y)).toBeCloseTo(1, 14);
      expect(p.jacobi).toBeCloseTo(3 - MU * (1 - MU), 12);
    }
    expect(L.L4.y).toBeGreaterThan(0);
    expect(L.L5.y).toBeCloseTo(-L.L4.y, 15);
  });

  it('makes every point an equilibrium: ∇Ω = 0 (common practice)', () => {
    for (const p of Object.values(L)) {
      const [gx, gy] = potentialGradient(MU, p.x, p.y);
      expect(Math.abs(gx) + Math.abs(gy)).toBeLessThan(1e-12);
    }
  });

  it('agrees with the preset: μ from the two GMs and the time unit of DESIGN.md', () => {
    const preset = findSystemPreset('earth-moon');
    expect(massRatioOf(preset)).toBeCloseTo(MU, 12);
    expect(timeUnitSecondsOf(preset)).toBeCloseTo(375190.262, 2);
  });
});

describe('Lagrange points, other mass ratios', () => {
  it('has L1 at the midpoint x = 0 and L2, L3 mirror images for equal masses (μ = 0.5, by symmetry)', () => {
    const L = pointsByName(0.5);
    expect(L.L1.x).toBeCloseTo(0, 14);
    expect(L.L2.x).toBeCloseTo(-L.L3.x, 12);
    expect(L.L2.jacobi).toBeCloseTo(L.L3.jacobi, 12);
    expect(L.L4.x).toBeCloseTo(0, 15);
  });

  it('approaches the Hill radius (μ/3)^(1/3) for small μ (Szebehely 1967, ch. 4, series in μ)', () => {
    for (const mu of [3.0404e-6, 2.528e-5]) { // Sun–(Earth+Moon), Jupiter–Europa (DESIGN.md)
      const L = pointsByName(mu);
      const hill = Math.cbrt(mu / 3);
      // Series: distance = h ∓ h²/3 − …; the first correction bounds the difference.
      expect(Math.abs(1 - mu - L.L1.x - hill)).toBeLessThan(hill * hill);
      expect(Math.abs(L.L2.x - (1 - mu) - hill)).toBeLessThan(hill * hill);
    }
  });

  it('satisfies ∇Ω = 0 for Pluto–Charon (μ = 0.1085) and Saturn–Titan (μ = 2.366e-4)', () => {
    for (const mu of [0.1085, 2.366e-4]) {
      for (const p of lagrangePoints(mu)) {
        const [gx, gy] = potentialGradient(mu, p.x, p.y);
        expect(Math.abs(gx) + Math.abs(gy), `${p.name} at μ = ${mu}`).toBeLessThan(1e-11);
        expect(p.jacobi).toBeCloseTo(jacobiConstant(mu, [p.x, p.y, 0, 0, 0, 0]), 14);
      }
    }
  });

  it('refuses μ outside (0, 0.5]', () => {
    expect(() => lagrangePoints(0)).toThrow(RangeError);
    expect(() => lagrangePoints(0.6)).toThrow(RangeError);
    expect(() => lagrangePoints(Number.NaN)).toThrow(RangeError);
  });
});

describe('linear in-plane period near the collinear points', () => {
  const L = pointsByName(MU);

  it('is 11.688 d at L1 and 14.648 d at L2 (DESIGN.md; Richardson 1980)', () => {
    expect(linearPlanarPeriod(MU, L.L1.x) * TIME_UNIT_DAYS).toBeCloseTo(11.688, 3);
    expect(linearPlanarPeriod(MU, L.L2.x) * TIME_UNIT_DAYS).toBeCloseTo(14.648, 3);
  });

  it('matches the half period of a small nonlinear orbit started on the linear solution', () => {
    // Linear solution x = A cos ωt, y = −kA sin ωt with k = (ω² + 1 + 2c₂)/(2ω) (Richardson 1980): start at
    // (x_L + A, 0) with vy = −kAω; the next crossing of y = 0 comes after half a period, to O(A).
    for (const p of [L.L1, L.L2]) {
      const period = linearPlanarPeriod(MU, p.x);
      const omega = (2 * Math.PI) / period;
      const c2 = (1 - MU) / Math.abs(p.x + MU) ** 3 + MU / Math.abs(p.x - 1 + MU) ** 3;
      const k = (omega * omega + 1 + 2 * c2) / (2 * omega);
      const amplitude = 1e-6;
      const run = propagate(MU, [p.x + amplitude, 0, 0, -k * amplitude * omega], period, {
        events: [yAxisCrossing({ terminalCount: 1 })],
      });
      expect(run.terminated).toBe(true);
      expect(Math.abs(run.tFinalNd - period / 2) / (period / 2)).toBeLessThan(1e-4);
    }
  });
});
