// Bicircular restricted four-body model (Huang 1960; Simó, Gómez, Jorba & Masdemont 1995).
// Checks: the Sun's parameters against the values of Simó et al. 1995 (from memory) and against Kepler's
// third law and the DE430 GM ratio (from memory); the equations against the gradient of the model's potential
// as Simó et al. write it; against an independent formulation (barycentric non-rotating axes, integrated by
// odex, an npm reference library); and the exact CR3BP limit for sunMass = 0.
import { Solver } from 'odex';
import { describe, expect, it } from 'vitest';
import {
  bicircularEquations, bicircularParameters, modelSynodicMonthNd, SIMO_1995_BICIRCULAR, sunRateFromMonthsNd,
  SYNODIC_MONTH_DAYS, SIDEREAL_MONTH_DAYS,
} from '../../generator/core/beyond/index.ts';
import { createDop853Workspace, integrateDop853 } from '../../generator/core/dop853/index.ts';
import { propagate } from '../../generator/core/propagation/propagate.ts';
import { findSystemPreset } from '../../generator/core/cr3bp/system-presets.ts';
import { MU } from './helpers/earth-moon-orbits.ts';

function runDop853(rhs: ReturnType<typeof bicircularEquations>, y0: readonly number[], duration: number, tol = 1e-12): Float64Array {
  const ws = createDop853Workspace(6);
  integrateDop853(rhs, ws, 0, y0, duration, { rtol: tol, atol: tol });
  return ws.y.slice();
}

describe('Sun parameters of the bicircular model', () => {
  it('derives the Sun rate from the synodic and sidereal months within 4e-6 of Simó et al. 1995', () => {
    // Simó et al. 1995 (from memory): ω_s = 0.925195985 in units of the Moon's mean motion.
    const rate = sunRateFromMonthsNd();
    expect(rate).toBeLessThan(0); // the Sun turns clockwise in the Earth–Moon rotating frame
    expect(Math.abs(Math.abs(rate) - SIMO_1995_BICIRCULAR.sunRateMagnitudeNd)).toBeLessThan(4e-6);
    // Equivalent form 1 − T_sid/T_year with T_year from 1/T_syn = 1/T_sid − 1/T_year (astronomical almanac).
    const yearDays = 1 / (1 / SIDEREAL_MONTH_DAYS - 1 / SYNODIC_MONTH_DAYS);
    expect(yearDays).toBeCloseTo(365.256, 1); // sidereal year 365.256 d (astronomical almanac, from memory)
    expect(-rate).toBeCloseTo(1 - SIDEREAL_MONTH_DAYS / yearDays, 14);
  });

  it('has a Sun mass matching the DE430 GM ratio Sun/(Earth + Moon) (from memory) to 1e-6', () => {
    const sunGm = 132712440018; // km³/s², JPL DE430 (from memory)
    const em = findSystemPreset('earth-moon');
    const ratio = sunGm / (em.primaryGmKm3S2 + em.secondaryGmKm3S2);
    expect(Math.abs(SIMO_1995_BICIRCULAR.sunMass / ratio - 1)).toBeLessThan(1e-6);
  });

  it('has a Sun distance consistent with Kepler’s third law for the Sun’s mass and mean motion (Simó et al. 1995)', () => {
    // Mean motion of the barycentre about the Sun, in units of the Moon's: 1 − |ω_s|; a³ n² = m_s + 1.
    const n = 1 - SIMO_1995_BICIRCULAR.sunRateMagnitudeNd;
    const a = Math.cbrt((SIMO_1995_BICIRCULAR.sunMass + 1) / (n * n));
    expect(Math.abs(a / SIMO_1995_BICIRCULAR.sunDistanceNd - 1)).toBeLessThan(1e-5);
  });

  it('puts the model synodic month at 2π/|ω_s| ≈ 6.79 time units (29.49 d at our 4.3425 d time unit)', () => {
    const p = bicircularParameters();
    expect(modelSynodicMonthNd(p)).toBeCloseTo((2 * Math.PI * SYNODIC_MONTH_DAYS) / SIDEREAL_MONTH_DAYS, 12);
  });

  it('rejects bad parameters with a message naming the field', () => {
    expect(() => bicircularParameters({ sunMass: -1 })).toThrow(/sunMass/);
    expect(() => bicircularParameters({ sunDistanceNd: 1 })).toThrow(/sunDistanceNd/);
    expect(() => bicircularParameters({ sunPhaseRad: NaN })).toThrow(/sunPhaseRad/);
  });
});

describe('bicircular equations', () => {
  it('are the gradient of Simó et al.’s potential Ω + m_s/r_s − (m_s/a_s²)(x cos θ + y sin θ) plus the Coriolis terms', () => {
    const sun = bicircularParameters({ sunPhaseRad: 0.7 });
    const rhs = bicircularEquations(MU, sun);
    const potential = (t: number, x: number, y: number, z: number) => {
      const th = sun.sunPhaseRad + sun.sunRateNd * t;
      const xs = sun.sunDistanceNd * Math.cos(th), ys = sun.sunDistanceNd * Math.sin(th);
      return (x * x + y * y) / 2 + (1 - MU) / Math.hypot(x + MU, y, z) + MU / Math.hypot(x - 1 + MU, y, z)
        + sun.sunMass / Math.hypot(x - xs, y - ys, z) - (sun.sunMass / sun.sunDistanceNd ** 2) * (x * Math.cos(th) + y * Math.sin(th));
    };
    const d = new Float64Array(6);
    const h = 1e-5;
    for (const [t, x, y, z, vx, vy] of [[0, 0.5, 0.3, 0.1, 0.2, -0.1], [3.7, -0.8, 0.2, -0.05, 0, 0.4], [11, 1.1, -0.4, 0.02, -0.3, 0.1]]) {
      rhs(t, Float64Array.of(x, y, z, vx, vy, 0), d);
      const grad = [
        (potential(t, x + h, y, z) - potential(t, x - h, y, z)) / (2 * h),
        (potential(t, x, y + h, z) - potential(t, x, y - h, z)) / (2 * h),
        (potential(t, x, y, z + h) - potential(t, x, y, z - h)) / (2 * h),
      ];
      // Central differences of a potential of size ~1e3 (the Sun's m_s/r_s): round-off ~1e-13·1e3/1e-5.
      expect(Math.abs(d[3] - (grad[0] + 2 * vy))).toBeLessThan(1e-6);
      expect(Math.abs(d[4] - (grad[1] - 2 * vx))).toBeLessThan(1e-6);
      expect(Math.abs(d[5] - grad[2])).toBeLessThan(1e-6);
    }
  });

  it('agree with the model written in barycentric non-rotating axes, integrated by odex', () => {
    // Independent formulation: Earth and Moon on circles of rate 1, the Sun at angle θ0 + (ω_s + 1)t, the
    // barycentre's acceleration toward the Sun m_s X_S / a_s³ subtracted (the frame is not inertial).
    const sun = bicircularParameters({ sunPhaseRad: 2.1 });
    const { sunMass: ms, sunDistanceNd: as } = sun;
    const inertialRhs = (t: number, s: number[]): number[] => {
      const [X, Y, Z, VX, VY, VZ] = s;
      const c = Math.cos(t), sn = Math.sin(t);
      const E = [-MU * c, -MU * sn, 0], M = [(1 - MU) * c, (1 - MU) * sn, 0];
      const phi = sun.sunPhaseRad + (sun.sunRateNd + 1) * t;
      const S = [as * Math.cos(phi), as * Math.sin(phi), 0];
      const acc = [0, 0, 0];
      for (const [body, gm] of [[E, 1 - MU], [M, MU], [S, ms]] as const) {
        const dx = X - body[0], dy = Y - body[1], dz = Z - body[2];
        const r3 = Math.hypot(dx, dy, dz) ** 3;
        acc[0] -= (gm * dx) / r3; acc[1] -= (gm * dy) / r3; acc[2] -= (gm * dz) / r3;
      }
      for (let k = 0; k < 3; k++) acc[k] -= (ms * S[k]) / as ** 3;
      return [VX, VY, VZ, acc[0], acc[1], acc[2]];
    };
    const duration = 3;
    for (const s0 of [[0.5, 0.1, 0.05, 0.1, 0.6, 0], [-0.9, 0, 0, 0, 0.9, 0.05], [1.1, 0.05, 0, 0, -0.4, 0]]) {
      const [x, y, z, vx, vy, vz] = s0;
      const solver = new Solver(6);
      solver.absoluteTolerance = 1e-13;
      solver.relativeTolerance = 1e-13;
      solver.maxSteps = 1_000_000;
      const out = solver.solve(inertialRhs, 0, [x, y, z, vx - y, vy + x, vz], duration);
      expect(out.outcome).toBe(0);
      const [X, Y, Z, VX, VY, VZ] = out.y;
      const c = Math.cos(duration), sn = Math.sin(duration);
      const xr = c * X + sn * Y, yr = -sn * X + c * Y;
      const expected = [xr, yr, Z, c * VX + sn * VY + yr, -sn * VX + c * VY - xr, VZ];
      const ours = runDop853(bicircularEquations(MU, sun), s0, duration);
      // The barycentric form subtracts two Sun terms of size m_s/a_s² ≈ 2.2 to leave a tidal ~5e-3: it loses
      // about three digits, hence 1e-8 rather than the 1e-12 the two integrators reach on the rotating form.
      for (let k = 0; k < 6; k++) expect(Math.abs(ours[k] - expected[k]), `component ${k} of ${s0}`).toBeLessThan(1e-8);
    }
  });

  it('reproduce the CR3BP propagation exactly with sunMass = 0 (to 1e-12 over a period of an E1M1 cycler)', () => {
    // The E1M1 start of the stable-window scan (helpers/earth-moon-orbits.ts), here only as a test trajectory.
    const s0 = [-0.7945862335775753, 0, 0, 0, -0.3525100848470284, 0];
    const duration = 14.290255065615174;
    for (const phase of [0, 1.3]) {
      const ours = runDop853(bicircularEquations(MU, bicircularParameters({ sunMass: 0, sunPhaseRad: phase })), s0, duration);
      const reference = propagate(MU, s0, duration, { rtol: 1e-12, atol: 1e-12 }).state;
      for (let k = 0; k < 6; k++) expect(Math.abs(ours[k] - reference[k])).toBeLessThanOrEqual(1e-12);
    }
  });

  it('respond linearly to a small Sun (the perturbation doubles with the Sun mass)', () => {
    const s0 = [0.5, 0.1, 0.05, 0.1, 0.6, 0];
    const base = runDop853(bicircularEquations(MU, bicircularParameters({ sunMass: 0 })), s0, 2);
    const shift = (m: number) => {
      const s = runDop853(bicircularEquations(MU, bicircularParameters({ sunMass: m })), s0, 2);
      return Math.hypot(...Array.from(s, (v, k) => v - base[k]));
    };
    // Tidal acceleration ~ m_s/a_s³ per unit distance: 1.7e-7 for m_s = 10.
    const small = shift(10), double = shift(20);
    expect(small).toBeGreaterThan(1e-8);
    expect(double / small).toBeCloseTo(2, 3);
  });
});
