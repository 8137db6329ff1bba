// The audit's Jacobi levels: seeded (the same seed gives the same levels, common practice for
// repeatable random checks), inside the range asked, and never within 1e-9 of a level discovery used.
import { describe, expect, it } from 'vitest';
import { drawAuditLevels, SAME_LEVEL_TOLERANCE } from '../../generator/core/orbits/audit-levels.ts';
import { seededRandom } from '../../generator/core/random/seeded-random.ts';
import { auditLevelsOfCatalog, BELOW_L1_GAP } from '../../generator/run/audit-levels-of-catalog.ts';
import { systemJacobiBounds } from '../../generator/config/system-jacobi-bounds.ts';
import type { LapSignatureJob } from '../../generator/core/orbits/audit-scan.ts';
import { E1M1_JOB } from './helpers/earth-moon-jobs.ts';

const range = { min: 3.01, max: 3.19 };

describe('drawAuditLevels', () => {
  it('gives the same sorted levels inside the range for the same seed, others for another', () => {
    const a = drawAuditLevels(seededRandom(5), 6, range, []);
    expect(drawAuditLevels(seededRandom(5), 6, range, [])).toEqual(a);
    expect(drawAuditLevels(seededRandom(6), 6, range, [])).not.toEqual(a);
    expect([...a].sort((p, q) => p - q)).toEqual(a);
    for (const c of a) expect(c >= range.min && c < range.max).toBe(true);
  });

  it('rejects a draw that falls on a discovery level (within 1e-9) and draws again', () => {
    // A stream whose first draw lands exactly on a discovery level, the next one just outside the tolerance.
    const used = range.min + 0.5 * (range.max - range.min);
    const draws = [0.5, 0.5 + (2 * SAME_LEVEL_TOLERANCE) / (range.max - range.min), 0.25];
    const stream = () => draws.shift()!;
    const levels = drawAuditLevels(stream, 2, range, [used + 0.5 * SAME_LEVEL_TOLERANCE]);
    expect(levels).toHaveLength(2);
    for (const c of levels) expect(Math.abs(c - used)).toBeGreaterThan(SAME_LEVEL_TOLERANCE);
  });

  it('says so when the range is empty', () => {
    expect(() => drawAuditLevels(seededRandom(1), 1, { min: 3.1, max: 3.1 }, [])).toThrow('audit level range is empty');
  });
});

describe('auditLevelsOfCatalog', () => {
  it('draws per system between C(L3) (or the jobs\' lower limit) and just below C(L1), away from discovery levels', () => {
    // Earth–Moon C(L1) and C(L3) from the Lagrange points (Szebehely 1967 tabulates 3.1883, 3.0121).
    const job = { ...E1M1_JOB, limits: { ...E1M1_JOB.limits, jacobiMin: 2.9, jacobiMax: 3.3 } } as LapSignatureJob;
    const bounds = systemJacobiBounds(job.system.mu);
    const levels = auditLevelsOfCatalog([job], 50, 99)[job.system.id];
    expect(levels).toHaveLength(50);
    for (const c of levels) {
      expect(c).toBeGreaterThanOrEqual(bounds.l3);
      expect(c).toBeLessThan(bounds.l1 - BELOW_L1_GAP);
      for (const used of job.seed.jacobiValues) expect(Math.abs(c - used)).toBeGreaterThan(SAME_LEVEL_TOLERANCE);
    }
    expect(auditLevelsOfCatalog([job], 50, 99)).toEqual({ [job.system.id]: levels });
  });
});
