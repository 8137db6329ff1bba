// A job that scans two Jacobi constants of the same family finds that family twice (once per scan) and must
// still hand it back once. Outside source: the mirror theorem (Roy & Ovenden 1955) makes a symmetric orbit
// fixed by its two perpendicular crossings and its period, so two seeds with the same crossings at the same C
// are one orbit; a family of symmetric periodic orbits is a curve through such orbits (Hénon 1997, Generating
// Families in the Restricted Three-Body Problem, ch. 2) and crosses each C where it does not fold only once.
import { beforeAll, describe, expect, it } from 'vitest';
import type { FamilyBundle } from '../../catalog-db/types.ts';
import { lagrangePoints } from '../../generator/core/cr3bp/lagrange-points.ts';
import { scanAxisSegment, type SeedCandidate } from '../../generator/core/orbits/scan-axis-segment.ts';
import { E1M1_JOB, E1M1_SCAN_JACOBI, EARTH_MOON, jobResult } from './helpers/earth-moon-jobs.ts';

const mu = EARTH_MOON.mu;

/** x0 of the family member at Jacobi constant C, interpolated between the two stored members around it. */
function familyX0At(family: FamilyBundle, jacobi: number): number[] {
  const found: number[] = [];
  const o = family.orbits;
  for (let i = 0; i + 1 < o.length; i++) {
    const a = o[i].jacobi, b = o[i + 1].jacobi;
    if ((a - jacobi) * (b - jacobi) > 0 || a === b) continue;
    const f = (jacobi - a) / (b - a);
    found.push(o[i].state0[0] + f * (o[i + 1].state0[0] - o[i].state0[0]));
  }
  return found;
}

describe('one family from two scans of it', () => {
  let bundles: FamilyBundle[];
  let seedsPerScan: SeedCandidate[][];
  beforeAll(() => {
    bundles = jobResult(E1M1_JOB).bundles;
    const rule = E1M1_JOB.seed;
    if (rule.kind !== 'lap-signature') throw new Error('E1M1_JOB must be a lap-signature job');
    // The same scan the job makes at each C (its documented options), one C at a time.
    const options = {
      rtol: E1M1_JOB.tolerance.rtol, atol: E1M1_JOB.tolerance.atol, maxHalfTimeNd: E1M1_JOB.limits.maxPeriodNd / 2,
      primaryRadiusNd: EARTH_MOON.primaryRadiusKm / EARTH_MOON.lengthUnitKm,
      secondaryRadiusNd: EARTH_MOON.secondaryRadiusKm / EARTH_MOON.lengthUnitKm,
      xL1: lagrangePoints(mu)[0].x, reachNd: 1.2,
    };
    seedsPerScan = E1M1_SCAN_JACOBI.map((jacobi) =>
      scanAxisSegment(mu, jacobi, rule.segments[0], rule.directions[0], rule.maxHalfCrossings, rule.gridPoints, options));
  });

  it('each of the two scans alone finds a seed on the family (so the job sees it twice)', () => {
    const family = bundles[0];
    E1M1_SCAN_JACOBI.forEach((jacobi, k) => {
      // The family passes this C exactly once (it does not fold in C here) ...
      const x0s = familyX0At(family, jacobi);
      expect(x0s, `C = ${jacobi}`).toHaveLength(1);
      // ... and the scan at this C has a seed there (1e-4 in x0 allows for the linear interpolation).
      const onFamily = seedsPerScan[k].filter((s) => Math.abs(s.x0 - x0s[0]) < 1e-4);
      expect(onFamily.length, `C = ${jacobi}: seeds ${seedsPerScan[k].map((s) => s.x0).join(', ')}`).toBeGreaterThanOrEqual(1);
    });
  });

  it('hands the family back once', () => {
    // Every bundle is E1M1; no two share an orbit at a common C (same x0 there to 1e-4).
    for (const bundle of bundles) expect(bundle.family.signature).toBe('E1M1');
    for (let i = 0; i < bundles.length; i++) {
      for (let j = i + 1; j < bundles.length; j++) {
        for (const orbit of bundles[j].orbits) {
          const x0s = familyX0At(bundles[i], orbit.jacobi);
          expect(x0s.some((x0) => Math.abs(x0 - orbit.state0[0]) < 1e-4), `${orbit.id} repeats ${bundles[i].family.id}`).toBe(false);
        }
      }
    }
    // Both seeds lie on one family, so exactly one bundle covers both scanned C values.
    const covering = bundles.filter((b) => E1M1_SCAN_JACOBI.every((c) => b.family.jacobiMin <= c && c <= b.family.jacobiMax));
    expect(covering).toHaveLength(1);
    expect(bundles).toHaveLength(1);
    expect(new Set(bundles.map((b) => b.family.id)).size).toBe(bundles.length);
  });
});
