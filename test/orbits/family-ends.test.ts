// Why a family stops, and that no stored orbit passes through a body. Closest approaches are found
// independently (helpers/odex-flow.ts): odex over the whole period, every local minimum of the distance where the
// radial velocity (r − r_body)·v turns from negative to positive on a fine grid of the dense output, then bisection.
// Outside sources: the documented end reasons are the EndReason union of generator/core/orbits/continue-family.ts
// (the contract the catalog's endReasonStart/endReasonEnd columns carry); body radii from DESIGN.md (WGS-84 Earth
// radius 6378.137 km, IAU mean lunar radius 1737.4 km, from memory).
import { beforeAll, describe, expect, it } from 'vitest';
import type { FamilyBundle } from '../../catalog-db/types.ts';
import { E1M1_JOB, EARTH_MOON, LYAPUNOV_JOB, jobResult } from './helpers/earth-moon-jobs.ts';
import { odexMinDistances } from './helpers/odex-flow.ts';

const mu = EARTH_MOON.mu;
const KM = EARTH_MOON.lengthUnitKm;

const DOCUMENTED_END_REASONS = [
  'member-limit', 'jacobi-range', 'period-limit', 'collision-primary', 'collision-secondary',
  'brake-orbit', 'signature-change', 'lost-l1-passage', 'precision-limit', 'no-convergence', 'unstable-far-from-windows', 'closed-loop', 'joins-family', 'interrupted',
];

interface Approaches {
  earthKm: number;
  moonKm: number;
}

describe('family ends and bodies', () => {
  let families: Array<{ job: typeof LYAPUNOV_JOB; bundle: FamilyBundle; approaches: Approaches[] }>;
  beforeAll(() => {
    families = [LYAPUNOV_JOB, E1M1_JOB].map((job) => {
      const bundle = jobResult(job).bundles[0];
      const approaches = bundle.orbits.map((o) => {
        const [earthNd, moonNd] = odexMinDistances(mu, o.state0, o.period, [-mu, 1 - mu]);
        return { earthKm: earthNd * KM, moonKm: moonNd * KM };
      });
      return { job, bundle, approaches };
    });
  });

  it('records an end reason at both ends, each among the documented values', () => {
    for (const { bundle } of families) {
      expect(DOCUMENTED_END_REASONS).toContain(bundle.family.endReasonStart);
      expect(DOCUMENTED_END_REASONS).toContain(bundle.family.endReasonEnd);
    }
  });

  it('stops at the member limit with exactly that many continued members', () => {
    // Located edge members are inserted after continuation: one per bifurcation row, and at most one per window
    // (its middle orbit, when no continued member sits there).
    const { job, bundle } = families[0];
    expect(bundle.family.endReasonStart).toBe('member-limit');
    expect(bundle.family.endReasonEnd).toBe('member-limit');
    const continued = bundle.orbits.length - bundle.bifurcations.length;
    expect(continued).toBeGreaterThanOrEqual(job.limits.maxMembers);
    expect(continued).toBeLessThanOrEqual(job.limits.maxMembers + bundle.stableWindows.length);
    expect(bundle.family.memberCount).toBe(bundle.orbits.length);
  });

  it('takes no seed beyond the period limit as a family (it would be one orbit ended at its own start)', () => {
    // The family's longest-period member handed to a job whose period limit lies just below that period.
    const { bundle } = families[1];
    const longest = bundle.orbits.reduce((a, b) => (b.period > a.period ? b : a));
    const job = { ...E1M1_JOB, key: 'test:E1M1-period-limit', limits: { ...E1M1_JOB.limits, maxPeriodNd: 0.99 * longest.period } };
    const result = jobResult(job, { handoffs: [{ state0: longest.state0, periodNd: longest.period }] });
    expect(result.bundles).toEqual([]);
  });

  it('follows the E1M1 family into the Moon at both ends (the flyby altitude goes to zero)', () => {
    // Physically this family ends where its lunar flyby meets the surface on both sides (see scratch/lyap.ts
    // E1M1); the tests below then check what such an end must satisfy.
    const { bundle } = families[1];
    expect(bundle.family.endReasonStart).toBe('collision-secondary');
    expect(bundle.family.endReasonEnd).toBe('collision-secondary');
  });

  it('never stores a member below a body\'s surface (independent closest approaches)', () => {
    for (const { bundle, approaches } of families) {
      bundle.orbits.forEach((orbit, k) => {
        // 1 m of slack for the independent search itself.
        expect(approaches[k].moonKm, `${orbit.id}: closest approach to the Moon (km)`).toBeGreaterThanOrEqual(EARTH_MOON.secondaryRadiusKm - 1e-3);
        expect(approaches[k].earthKm, `${orbit.id}: closest approach to the Earth (km)`).toBeGreaterThanOrEqual(EARTH_MOON.primaryRadiusKm - 1e-3);
      });
    }
  });

  it('reaches the body at a collision end: the end member passes within 10 km of the surface', () => {
    let collisionEnds = 0;
    for (const { bundle, approaches } of families) {
      const ends = [
        { reason: bundle.family.endReasonStart, k: 0 },
        { reason: bundle.family.endReasonEnd, k: bundle.orbits.length - 1 },
      ];
      for (const { reason, k } of ends) {
        if (reason !== 'collision-primary' && reason !== 'collision-secondary') continue;
        collisionEnds++;
        const altitudeKm = reason === 'collision-secondary'
          ? approaches[k].moonKm - EARTH_MOON.secondaryRadiusKm
          : approaches[k].earthKm - EARTH_MOON.primaryRadiusKm;
        expect(altitudeKm, `${bundle.orbits[k].id} (${reason})`).toBeGreaterThanOrEqual(-1e-3);
        expect(altitudeKm, `${bundle.orbits[k].id} (${reason})`).toBeLessThan(10);
      }
    }
    expect(collisionEnds).toBeGreaterThan(0);
  });

  it('stores closest approaches that agree with the independent search to 10 m', () => {
    for (const { bundle, approaches } of families) {
      bundle.orbits.forEach((orbit, k) => {
        expect(Math.abs(orbit.secondaryMinRadiusKm - approaches[k].moonKm), `${orbit.id}: Moon (stored ${orbit.secondaryMinRadiusKm} km)`).toBeLessThan(0.01);
        expect(Math.abs(orbit.primaryMinRadiusKm - approaches[k].earthKm), `${orbit.id}: Earth (stored ${orbit.primaryMinRadiusKm} km)`).toBeLessThan(0.01);
      });
    }
  });
});
