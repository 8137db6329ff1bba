// Small planar Lyapunov orbits about Earth–Moon L1 tend to the linearised motion about L1 as the amplitude
// shrinks: the period to 2π/ω, the in-plane index to cosh(σ·2π/ω), the vertical index to cos(√c₂·2π/ω).
// Outside sources: Richardson 1980 (Celest. Mech. 22) for the linearised planar motion about a collinear point,
// λ⁴ + (2 − c₂)λ² + (1 + 2c₂)(1 − c₂) = 0 with roots ±σ, ±iω, and the vertical frequency √c₂; its
// Lindstedt–Poincaré expansion makes the frequency correction start at second order in the amplitude.
// Szebehely 1967 (Theory of Orbits, ch. 5) for the instability of the collinear points (σ real).
import { beforeAll, describe, expect, it } from 'vitest';
import type { FamilyBundle } from '../../catalog-db/types.ts';
import { lagrangePoints } from '../../generator/core/cr3bp/lagrange-points.ts';
import { linearPlanarPeriod } from '../helpers/linear-planar-period.ts';
import { EARTH_MOON, LYAPUNOV_JOB, jobResult } from './helpers/earth-moon-jobs.ts';
import { odexFlow } from './helpers/odex-flow.ts';

const mu = EARTH_MOON.mu;
const SECONDS_PER_DAY = 86400;

interface Sample {
  amplitudeNd: number; // half the x-extent between the two perpendicular crossings
  periodNd: number;
  inPlane: number;
  vertical: number;
}

describe('small L1 Lyapunov orbits (Richardson 1980)', () => {
  let family: FamilyBundle;
  let samples: Sample[];
  let xL1: number;
  let c2: number;
  let linearPeriodNd: number;
  beforeAll(() => {
    family = jobResult(LYAPUNOV_JOB).bundles[0];
    xL1 = lagrangePoints(mu)[0].x;
    c2 = (1 - mu) / Math.abs(xL1 + mu) ** 3 + mu / Math.abs(xL1 - 1 + mu) ** 3;
    linearPeriodNd = linearPlanarPeriod(mu, xL1);
    // The amplitude is measured on the orbit itself (x at T/2 from an independent propagation).
    samples = family.orbits.map((o) => {
      const xHalf = odexFlow(mu, o.state0, o.period / 2).state[0];
      return { amplitudeNd: Math.abs(xHalf - o.state0[0]) / 2, periodNd: o.period, inPlane: o.stabilityIndex, vertical: o.verticalStabilityIndex };
    }).sort((a, b) => a.amplitudeNd - b.amplitudeNd);
  });

  it('the linear period about Earth–Moon L1 is 11.688 d', () => {
    // DESIGN.md check value from Richardson 1980 (ω² = (2 − c₂ + √(9c₂² − 8c₂))/2).
    expect((linearPeriodNd * EARTH_MOON.timeUnitS) / SECONDS_PER_DAY).toBeCloseTo(11.688, 3);
  });

  it('the family reaches amplitudes below 1e-4 (about 40 km) and up to 1e-2', () => {
    expect(samples[0].amplitudeNd).toBeLessThan(1e-4);
    expect(samples[samples.length - 1].amplitudeNd).toBeGreaterThan(1e-2);
  });

  it('the period tends to 2π/ω, with an error shrinking quadratically in the amplitude', () => {
    // Smallest orbit: period within 1e-6 (relative) of the linear one (error ~77·A², A < 1e-4).
    const smallest = samples[0];
    expect(Math.abs(smallest.periodNd - linearPeriodNd) / linearPeriodNd).toBeLessThan(1e-6);
    // Every orbit is slower than the linear oscillation (positive second-order frequency correction).
    for (const s of samples) expect(s.periodNd).toBeGreaterThan(linearPeriodNd);
    // Log–log slope of the relative period error against amplitude over 3e-4 ≤ A ≤ 1e-2: 2 (quadratic).
    const fit = samples.filter((s) => s.amplitudeNd >= 3e-4 && s.amplitudeNd <= 1e-2);
    expect(fit.length).toBeGreaterThan(10);
    const xs = fit.map((s) => Math.log(s.amplitudeNd));
    const ys = fit.map((s) => Math.log((s.periodNd - linearPeriodNd) / linearPeriodNd));
    const mx = xs.reduce((a, b) => a + b) / xs.length, my = ys.reduce((a, b) => a + b) / ys.length;
    const slope = xs.reduce((a, x, i) => a + (x - mx) * (ys[i] - my), 0) / xs.reduce((a, x) => a + (x - mx) ** 2, 0);
    expect(slope).toBeGreaterThan(1.95);
    expect(slope).toBeLessThan(2.05);
    // ... and the coefficient (T − T₀)/(T₀ A²) is the same at both ends of that range to 1 %.
    const coefficient = (s: Sample) => (s.periodNd - linearPeriodNd) / linearPeriodNd / s.amplitudeNd ** 2;
    expect(coefficient(fit[0]) / coefficient(fit[fit.length - 1])).toBeCloseTo(1, 2);
  });

  it('the in-plane index is large and positive along the family and tends to cosh(σ·2π/ω)', () => {
    // Unstable: ν ≫ 1 everywhere (Szebehely 1967; common practice: ν ≈ 1e3 for Earth–Moon L1 Lyapunov orbits).
    for (const s of samples) {
      expect(s.inPlane).toBeGreaterThan(500);
      expect(s.inPlane).toBeLessThan(3000);
    }
    // Linear limit (Richardson 1980): the hyperbolic pair e^{±σT} with T = 2π/ω, so ν → cosh(σT).
    const sigma = Math.sqrt((c2 - 2 + Math.sqrt(9 * c2 * c2 - 8 * c2)) / 2);
    const limit = Math.cosh(sigma * linearPeriodNd);
    expect(limit).toBeGreaterThan(1000);
    expect(Math.abs(samples[0].inPlane - limit) / limit).toBeLessThan(1e-5);
  });

  it('the vertical index tends to cos(√c₂·2π/ω), the linear vertical oscillation over one period', () => {
    // Richardson 1980: z̈ = −c₂ z in the linearised problem, so the (z, vz) block is a rotation by √c₂·T.
    const limit = Math.cos(Math.sqrt(c2) * linearPeriodNd);
    expect(Math.abs(samples[0].vertical - limit)).toBeLessThan(1e-6);
  });
});
