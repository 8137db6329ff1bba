// A family passes a stretch where ν is smooth but very steep instead of ending there with no-convergence.
// The E2M2 family through x0 ≈ 0.89263, ẏ0 ≈ −0.42435 (C ≈ 3.05554, period ≈ 38.08, found by the demo run)
// changes its in-plane index by some 1e9 per unit of arclength there: steps of a few 1e-10 are needed to keep
// every change of asinh(ν) within the step rule (common practice: continuation that resolves the indices,
// Doedel et al. 2007). Checks: neighbours keep the step rule through the stretch; the members there are
// periodic (mirror theorem, Roy & Ovenden 1955: ẋ = 0 at T/2) and their steep change of ν is real: the
// monodromy of odex (an independent integrator on npm, own variational equations) gives the same change
// (Hénon 1973: ν = (tr M_plane − 2)/2).
import { beforeAll, describe, expect, it } from 'vitest';
import type { FamilyBundle, OrbitRow } from '../../catalog-db/types.ts';
import type { FamilyJob } from '../../generator/core/orbits/family-job.ts';
import { runFamilyJob } from '../../generator/core/orbits/run-family-job.ts';
import { EARTH_MOON } from './helpers/earth-moon-jobs.ts';
import { odexFlow } from './helpers/odex-flow.ts';

const mu = EARTH_MOON.mu;

const STEEP_JOB: FamilyJob = {
  key: 'test:E2M2-steep', name: 'E2M2 steep (test)', system: EARTH_MOON,
  // Discovery is not used: the job follows one hand-off orbit.
  seed: { kind: 'lap-signature', signature: 'E2M2', segments: ['between'], directions: [-1], maxHalfCrossings: 8, gridPoints: 10, jacobiValues: [3.05] },
  limits: { maxMembers: 150, jacobiMin: 2.9, jacobiMax: 3.18, maxPeriodNd: 40, unstableStop: null, initialStepNd: 1e-3, maxStepNd: 0.02 },
  tolerance: { rtol: 1e-12, atol: 1e-12 }, indexTolerance: 1e-6,
};

const START = { state0: [0.8926262792757415, 0, 0, 0, -0.42435047840385626, 0], periodNd: 38.0800218077934 };

const gap = (a: OrbitRow, b: OrbitRow) => Math.hypot(a.state0[0]! - b.state0[0]!, a.state0[4]! - b.state0[4]!);

/** Neighbours stated from the same crossing (a switch of crossing stores one orbit twice, far apart in x0). */
function sameCrossingPairs(b: FamilyBundle): Array<[OrbitRow, OrbitRow]> {
  return b.orbits.slice(1).map((o, i): [OrbitRow, OrbitRow] => [b.orbits[i]!, o]).filter(([a, c]) => gap(a, c) > 0 && gap(a, c) < 1e-2);
}

function odexIndex(o: OrbitRow): number {
  const m = odexFlow(mu, o.state0, o.period, { tolerance: 1e-13, stm: true }).stm!;
  const at = (i: number, j: number) => m[6 * i + j]!;
  return (at(0, 0) + at(1, 1) + at(3, 3) + at(4, 4) - 2) / 2;
}

describe('a steep stretch of the stability index', () => {
  let family: FamilyBundle;
  beforeAll(() => {
    const result = runFamilyJob(STEEP_JOB, {}, { handoffs: [START] });
    expect(result.bundles).toHaveLength(1);
    family = result.bundles[0]!;
  });

  it('is passed: neither end is no-convergence and every step keeps the step rule', () => {
    expect([family.family.endReasonStart, family.family.endReasonEnd]).not.toContain('no-convergence');
    for (const [a, b] of sameCrossingPairs(family)) {
      expect(Math.abs(Math.asinh(a.stabilityIndex) - Math.asinh(b.stabilityIndex)), `${a.id} → ${b.id}`).toBeLessThanOrEqual(0.25 + 1e-12);
    }
  });

  it('is real: periodic members whose steep change of ν an independent monodromy confirms', () => {
    const [a, b] = sameCrossingPairs(family).reduce((best, pair) =>
      Math.abs(pair[0].stabilityIndex - pair[1].stabilityIndex) / gap(...pair) > Math.abs(best[0].stabilityIndex - best[1].stabilityIndex) / gap(...best) ? pair : best);
    const slope = Math.abs(a.stabilityIndex - b.stabilityIndex) / gap(a, b);
    expect(slope, 'steepest dν/ds').toBeGreaterThan(1e8);
    for (const o of [a, b]) {
      const half = odexFlow(mu, o.state0, o.period / 2, { tolerance: 1e-13 }).state;
      expect(Math.abs(half[1]!), `${o.id}: y at T/2`).toBeLessThan(1e-7);
      expect(Math.abs(half[3]!), `${o.id}: vx at T/2`).toBeLessThan(1e-6);
    }
    const change = b.stabilityIndex - a.stabilityIndex;
    expect(Math.abs(change)).toBeGreaterThan(0.1);
    expect(Math.abs(odexIndex(b) - odexIndex(a) - change), 'ν(b) − ν(a), odex against the catalog').toBeLessThan(0.01 * Math.abs(change));
  });
});
