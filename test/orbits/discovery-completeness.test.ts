// Discovery misses nothing a much finer search finds (common practice: a convergence check on the grid).
// On a small domain — Earth–Moon E1M1, C from 3.00 to 3.06, both far sides, both start directions,
// half periods up to three crossings of y = 0 — the job's discovery grid (12 levels × 120 start points
// per segment) and continuation give some families; an independent brute-force scan at 6 other levels
// with 4 times the start points (audit-scan.ts: 1-D roots per level, Newton on ẏ0, Howell 1984) must find
// no symmetric orbit of that signature off them (mirror theorem, Roy & Ovenden 1955: every root of ẋ at
// a perpendicular crossing is a symmetric periodic orbit).
import { beforeAll, describe, expect, it } from 'vitest';
import type { FamilyBundle } from '../../catalog-db/types.ts';
import { storedOrbitFootprint } from '../../generator/core/orbits/audit-footprint.ts';
import { auditJob } from './helpers/audit-job.ts';
import type { LapSignatureJob } from '../../generator/core/orbits/audit-scan.ts';
import { seededRandom } from '../../generator/core/random/seeded-random.ts';
import { EARTH_MOON, jobResult } from './helpers/earth-moon-jobs.ts';

const LEVELS = Array.from({ length: 12 }, (_, i) => 3.0 + (0.06 * i) / 11);

const JOB: LapSignatureJob = {
  key: 'test:E1M1-domain', name: 'E1M1 small domain (test)', system: EARTH_MOON,
  seed: {
    kind: 'lap-signature', signature: 'E1M1', segments: ['far-primary', 'far-secondary'], directions: [1, -1],
    maxHalfCrossings: 3, gridPoints: 120, jacobiValues: LEVELS,
  },
  limits: { maxMembers: 2000, jacobiMin: 3.0, jacobiMax: 3.06, maxPeriodNd: 30, unstableStop: null, initialStepNd: 1e-3, maxStepNd: 0.02 },
  tolerance: { rtol: 1e-12, atol: 1e-12 }, indexTolerance: 1e-6,
};

describe('discovery on a small domain against a brute-force scan', () => {
  let bundles: FamilyBundle[];
  beforeAll(() => {
    bundles = jobResult(JOB).bundles;
  });

  it('finds families there', () => {
    expect(bundles.length).toBeGreaterThan(0);
    for (const b of bundles) {
      expect(b.family.jacobiMin).toBeGreaterThanOrEqual(3.0 - 1e-9);
      expect(b.family.jacobiMax).toBeLessThanOrEqual(3.06 + 1e-9);
    }
  });

  it('leaves no orbit for a scan 4 times as fine at 6 other levels', () => {
    const random = seededRandom(20261202);
    const levels = Array.from({ length: 6 }, () => 3.0 + 0.06 * random()).filter((c) => LEVELS.every((l) => Math.abs(l - c) > 1e-6));
    const families = bundles.map((b) => b.orbits.map((o) => storedOrbitFootprint(EARTH_MOON.mu, o.state0, o.period, JOB.tolerance)));
    const audit = auditJob({ job: JOB, levels, families, gridFactor: 4 });
    expect(audit.orbitsChecked).toBeGreaterThanOrEqual(levels.length); // the scan does find the families' orbits
    expect(audit.misses.map((m) => `C=${m.jacobi.toFixed(6)} x0=${m.x0.toFixed(6)} vy0=${m.vy0.toFixed(6)}`)).toEqual([]);
  });
});
