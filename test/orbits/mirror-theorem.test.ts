// Every generated orbit is a symmetric periodic orbit: propagated over one period from its stored state0 by an
// independent integrator it closes, and at T/2 it crosses y = 0 perpendicularly.
// Outside source: the mirror theorem (Roy & Ovenden 1955, MNRAS 115): an orbit with two perpendicular crossings
// of the x-axis is periodic and symmetric about it, the second crossing falling at half the period.
import { beforeAll, describe, expect, it } from 'vitest';
import type { FamilyBundle } from '../../catalog-db/types.ts';
import { E1M1_JOB, EARTH_MOON, LYAPUNOV_JOB, jobResult } from './helpers/earth-moon-jobs.ts';
import { largestMultiplier } from './helpers/independent-analysis.ts';
import { odexFlow } from './helpers/odex-flow.ts';

const mu = EARTH_MOON.mu;

// Closure bound. A stored orbit is exact only to the corrector's residual (~1e-11) and the integrators' local
// errors (~1e-13); over one period any such error grows at most by the largest multiplier |λ| = |ν| + √(ν² − 1)
// (Hénon 1973 for ν). Members with |λ| below ~1e4 must close to 1e-8 (common practice for catalogued CR3BP
// orbits); for violently unstable members round-off alone grows by |λ|, so the bound there is 1e-12·|λ|.
const closureBound = (stabilityIndex: number) => 1e-12 * Math.max(1e4, largestMultiplier(stabilityIndex));

function checkFamily(bundle: FamilyBundle): void {
  expect(bundle.orbits.length).toBeGreaterThan(10);
  for (const orbit of bundle.orbits) {
    const bound = closureBound(orbit.stabilityIndex);
    // A planar symmetric start: on the x-axis, velocity perpendicular to it (Roy & Ovenden 1955).
    expect(orbit.state0[1]).toBe(0);
    expect(orbit.state0[2]).toBe(0);
    expect(orbit.state0[3]).toBe(0);
    expect(orbit.state0[5]).toBe(0);

    // Second perpendicular crossing at T/2: y = 0 and vx = 0 there (z, vz stay 0 for a planar orbit).
    const half = odexFlow(mu, orbit.state0, orbit.period / 2).state;
    const end = odexFlow(mu, half, orbit.period / 2).state; // on to T
    const closure = Math.hypot(...end.map((v, i) => v - orbit.state0[i]));
    expect(closure, `${orbit.id}: closure after one period`).toBeLessThanOrEqual(bound);

    expect(Math.abs(half[1]), `${orbit.id}: y at T/2`).toBeLessThanOrEqual(bound);
    expect(Math.abs(half[3]), `${orbit.id}: vx at T/2`).toBeLessThanOrEqual(bound);
    // ... and it is a true crossing, not a tangency: |vy| far above the bound.
    expect(Math.abs(half[4]), `${orbit.id}: vy at T/2`).toBeGreaterThan(1e3 * bound);
  }
}

describe('mirror theorem on generated families (Roy & Ovenden 1955)', () => {
  let lyapunov: FamilyBundle;
  let cycler: FamilyBundle;
  beforeAll(() => {
    lyapunov = jobResult(LYAPUNOV_JOB).bundles[0];
    cycler = jobResult(E1M1_JOB).bundles[0];
  });

  it('every L1 Lyapunov orbit closes after one period and crosses y = 0 perpendicularly at T/2', () => {
    checkFamily(lyapunov);
  });

  it('every E1M1 orbit closes after one period and crosses y = 0 perpendicularly at T/2', () => {
    checkFamily(cycler);
  });

  it('the closure test can fail: a member with its period off by 1e-6 does not close', () => {
    // Guards the check above: a wrong period must show up far above the bound.
    const orbit = cycler.orbits[Math.floor(cycler.orbits.length / 2)];
    const end = odexFlow(mu, orbit.state0, orbit.period * (1 + 1e-6)).state;
    const closure = Math.hypot(...end.map((v, i) => v - orbit.state0[i]));
    expect(closure).toBeGreaterThan(100 * closureBound(orbit.stabilityIndex));
  });
});
