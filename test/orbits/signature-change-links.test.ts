// Where a family's lap signature changes, the catalog records the first orbit past that end and the family
// it continues into. The E1M2 family of helpers/earth-moon-jobs.ts (SIGNATURE_CHANGE_JOB) becomes E1M0 at its
// low-C end.
// Checks: the orbit past the end is a periodic orbit (mirror theorem, Roy & Ovenden 1955: ẋ = 0 at T/2,
// checked with odex, an independent integrator on npm) with the new signature; with an E1M0 job in the run that
// has no family yet, the linking pass follows the hand-off as an E1M0 family, links the E1M2 end to it, and
// links that family's own change back to the E1M2 family (one boundary seen from both sides: common practice).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openCatalogForRead, openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import type { FamilyBundle, SignatureChangeRow } from '../../catalog-db/types.ts';
import { lagrangePoints } from '../../generator/core/cr3bp/lagrange-points.ts';
import { analyseOrbit } from '../../generator/core/orbits/analyse-orbit.ts';
import type { FamilyJob } from '../../generator/core/orbits/family-job.ts';
import { formatSignature } from '../../generator/core/cr3bp/lap-signature.ts';
import { linkSignatureChanges, type LinkSummary } from '../../generator/run/link-signature-changes.ts';
import { createFamilyPool, type FamilyPool } from '../../generator/run/worker-pool.ts';
import { makeRunInput } from '../catalog-db/make-rows.ts';
import { useTempCatalogDir } from '../catalog-db/temp-catalog-path.ts';
import { EARTH_MOON, SIGNATURE_CHANGE_INPUTS, SIGNATURE_CHANGE_JOB, jobResult } from './helpers/earth-moon-jobs.ts';
import { odexFlow } from './helpers/odex-flow.ts';

const mu = EARTH_MOON.mu;
const xL1 = lagrangePoints(mu)[0]!.x;
const tempPath = useTempCatalogDir();

describe('signature changes: the orbit past the end and the family it continues into', () => {
  let bundles: FamilyBundle[];
  beforeAll(() => {
    bundles = jobResult(SIGNATURE_CHANGE_JOB, SIGNATURE_CHANGE_INPUTS).bundles;
  });

  it('records, at each signature-change end, a periodic orbit with another signature', () => {
    const changed = bundles.filter((b) => b.family.endReasonStart === 'signature-change' || b.family.endReasonEnd === 'signature-change');
    expect(changed.length).toBeGreaterThan(0);
    for (const b of bundles) {
      const sides = (b.signatureChanges ?? []).map((c) => c.side).sort();
      const expected = [b.family.endReasonEnd === 'signature-change' ? 'end' : null, b.family.endReasonStart === 'signature-change' ? 'start' : null].filter(Boolean).sort();
      expect(sides, b.family.id).toEqual(expected);
      for (const c of b.signatureChanges ?? []) {
        const half = odexFlow(mu, c.state0, c.period / 2, { tolerance: 1e-13 }).state;
        expect(Math.abs(half[3]!), `${b.family.id} ${c.side}: ẋ at T/2`).toBeLessThan(1e-6);
        expect(c.signature, `${b.family.id} ${c.side}`).not.toBe(b.family.signature);
        // The lap is gained or lost at a grazing pair of x-axis crossings, too close for sampled counting:
        // the generator's own event-located count names it.
        const a = analyseOrbit({ mu, xL1, rtol: 1e-12, atol: 1e-12 }, c.state0[0], c.state0[4], c.period);
        expect(formatSignature('E', 'M', a.laps), `${b.family.id} ${c.side}`).toBe(c.signature);
      }
    }
  });

  describe('linking pass', () => {
    let pool: FamilyPool | null = null;
    let summary: LinkSummary;
    let changes: SignatureChangeRow[];
    let families: { id: string; signature: string; configKey: string }[];
    const target = (): FamilyJob => {
      const signature = bundles.flatMap((b) => b.signatureChanges ?? [])[0]!.signature;
      return { ...SIGNATURE_CHANGE_JOB, key: `test:${signature}-handoff`, name: `${signature} (test)`, seed: { ...SIGNATURE_CHANGE_JOB.seed, signature } as FamilyJob['seed'] };
    };
    beforeAll(async () => {
      const path = tempPath('links.sqlite');
      const writer = openCatalogForWrite(path);
      const job = target();
      try {
        writer.upsertSystem(EARTH_MOON);
        const runId = writer.startRun(makeRunInput());
        for (const b of bundles) writer.writeFamily({ ...b, family: { ...b.family, runId } });
        writer.markJobDone(SIGNATURE_CHANGE_JOB, runId);
        writer.markJobDone(job, runId); // done, with no family: the hand-off is all it gets
        summary = await linkSignatureChanges({
          dbPath: path, writer, runId, jobs: [SIGNATURE_CHANGE_JOB, job], log: () => {}, pool: () => (pool ??= createFamilyPool(1)),
        });
      } finally {
        writer.close();
      }
      const reader = openCatalogForRead(path);
      changes = reader.signatureChanges();
      families = reader.families();
      reader.close();
    }, 300_000);
    afterAll(async () => {
      await pool?.destroy();
    });

    it('follows the hand-off once as a family of the job of the new signature and links the end to it', () => {
      const job = target();
      expect(summary.followed).toBeGreaterThan(0);
      expect(summary.familiesWritten).toBeGreaterThan(0);
      const fromSource = changes.filter((c) => bundles.some((b) => b.family.id === c.familyId));
      for (const c of fromSource) {
        expect(c.followedUp || c.intoFamilyId !== null, `${c.familyId} ${c.side}`).toBe(true);
        if (c.intoFamilyId === null) continue;
        const into = families.find((f) => f.id === c.intoFamilyId)!;
        expect(into.signature).toBe(c.signature);
        expect(into.configKey).toBe(job.key);
      }
      expect(fromSource.some((c) => c.intoFamilyId !== null)).toBe(true);
    });

    it('links the new family\'s change back to the family it came from', () => {
      const sourceIds = new Set(bundles.map((b) => b.family.id));
      const reverse = changes.filter((c) => !sourceIds.has(c.familyId) && c.intoFamilyId !== null && sourceIds.has(c.intoFamilyId));
      expect(reverse.length, JSON.stringify(changes.map((c) => [c.familyId, c.side, c.signature, c.intoFamilyId]))).toBeGreaterThan(0);
    });
  });
});
