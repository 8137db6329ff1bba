// writeFamily is one transaction (all or nothing) that replaces a family with everything under it,
// and the job bookkeeping used by resume. Contract: CatalogWriter in catalog-db/types.ts.
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { openCatalogForRead, openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import type { CatalogWriter, FamilyBundle } from '../../catalog-db/types.ts';
import { makeBundle, makeRunInput, makeSystem } from './make-rows.ts';
import { useTempCatalogDir } from './temp-catalog-path.ts';

const catalogPath = useTempCatalogDir();
const familyId = 'test-system/B2S1/a';

function catalogWithFamily(name: string): { path: string; writer: CatalogWriter; runId: number; first: FamilyBundle } {
  const path = catalogPath(name);
  const writer = openCatalogForWrite(path);
  writer.upsertSystem(makeSystem());
  const runId = writer.startRun(makeRunInput());
  const first = makeBundle(familyId, { runId, orbitCount: 6 });
  writer.writeFamily(first);
  return { path, writer, runId, first };
}

function expectFamilyIntact(path: string, bundle: FamilyBundle): void {
  const reader = openCatalogForRead(path);
  expect(reader.family(bundle.family.id)).toEqual(bundle.family);
  expect(reader.orbits(bundle.family.id)).toEqual(bundle.orbits);
  expect(reader.stableWindows(bundle.family.id)).toEqual(bundle.stableWindows);
  expect(reader.bifurcations(bundle.family.id)).toEqual(bundle.bifurcations);
  reader.close();
}

describe('writeFamily', () => {
  it('replacing a family removes its old orbits, windows and bifurcations', () => {
    const { path, writer, runId, first } = catalogWithFamily('replace.sqlite');
    const second = makeBundle(familyId, { runId, orbitCount: 2, offset: 1 }); // fewer orbits, no window
    writer.writeFamily(second);
    writer.close();
    expectFamilyIntact(path, second);
    const reader = openCatalogForRead(path);
    for (const old of first.orbits.slice(2)) expect(reader.orbit(old.id)).toBeUndefined();
    expect(reader.orbits()).toHaveLength(2);
    expect(reader.stableWindows()).toEqual([]);
    expect(reader.bifurcations()).toEqual(second.bifurcations);
    reader.close();
  });

  it('keeps the previous version intact when an insert fails mid-transaction (duplicate orbit id)', () => {
    const { path, writer, runId, first } = catalogWithFamily('duplicate.sqlite');
    const broken = makeBundle(familyId, { runId, orbitCount: 6, offset: 2 });
    broken.orbits[4] = { ...broken.orbits[4]!, id: broken.orbits[1]!.id }; // fails on the 5th orbit insert
    expect(() => writer.writeFamily(broken, { key: 'job-x' })).toThrow(
      /^writeFamily test-system\/B2S1\/a: nothing written \(UNIQUE constraint failed: orbits\.id\)$/,
    );
    expect(writer.jobDone('job-x')).toBe(false); // the job mark rolls back with the family
    writer.close();
    expectFamilyIntact(path, first);
  });

  it('keeps the previous version intact when the last row is bad (NaN in the last bifurcation)', () => {
    const { path, writer, runId, first } = catalogWithFamily('nan.sqlite');
    const broken = makeBundle(familyId, { runId, orbitCount: 6, offset: 3 });
    broken.bifurcations[1]!.jacobi = Number.NaN;
    expect(() => writer.writeFamily(broken)).toThrow('bifurcation test-system/B2S1/a/b1: jacobi must be a finite number');
    writer.close();
    expectFamilyIntact(path, first);
  });

  it('keeps the previous version when the job key is bad (the last step of the transaction)', () => {
    const { path, writer, runId, first } = catalogWithFamily('bad-job.sqlite');
    expect(() => writer.writeFamily(makeBundle(familyId, { runId, offset: 4 }), { key: '' })).toThrow("the job's key must be a non-empty string");
    writer.close();
    expectFamilyIntact(path, first);
  });

  it('refuses an inconsistent bundle with a one-line error and writes nothing', () => {
    const { path, writer, runId, first } = catalogWithFamily('inconsistent.sqlite');
    const wrongCount = makeBundle(familyId, { runId, offset: 5 });
    wrongCount.family.memberCount = 99;
    expect(() => writer.writeFamily(wrongCount)).toThrow('memberCount must equal the 5 orbits given, got 99');
    const stray = makeBundle(familyId, { runId, offset: 5 });
    stray.orbits[0]!.familyId = 'elsewhere';
    expect(() => writer.writeFamily(stray)).toThrow('familyId must be test-system/B2S1/a');
    const dangling = makeBundle(familyId, { runId, offset: 5 });
    dangling.stableWindows[0]!.midOrbitId = 'nowhere';
    expect(() => writer.writeFamily(dangling)).toThrow("midOrbitId must be one of the family's orbits, got nowhere");
    expect(() => writer.writeFamily(makeBundle(familyId, { runId: runId + 50 }))).toThrow(`runId ${runId + 50} is not in the catalog`);
    expect(() => writer.writeFamily(makeBundle(familyId, { runId, systemId: 'ghost' }))).toThrow(
      'systemId ghost is not in the catalog',
    );
    writer.close();
    expectFamilyIntact(path, first);
  });

  it('leaves no orphan rows behind after replacements (foreign keys and cascade)', () => {
    const { path, writer, runId } = catalogWithFamily('orphans.sqlite');
    for (let k = 0; k < 3; k++) writer.writeFamily(makeBundle(familyId, { runId, orbitCount: 4 + k, offset: k }));
    writer.close();
    const db = new Database(path, { readonly: true });
    expect(db.pragma('foreign_key_check')).toEqual([]);
    const count = (table: string) => (db.prepare(`SELECT count(*) AS n FROM ${table}`).get() as { n: number }).n;
    expect([count('families'), count('orbits'), count('stable_windows'), count('bifurcations')]).toEqual([1, 6, 1, 2]);
    db.close();
  });
});

describe('jobs', () => {
  it('jobDone is false until writeFamily completes the job or markJobDone marks it', () => {
    const { path, writer, runId } = catalogWithFamily('jobs.sqlite');
    expect(writer.jobDone('job:a')).toBe(false);
    writer.writeFamily(makeBundle('test-system/B2S1/b', { runId }));
    expect(writer.jobDone('job:a')).toBe(false); // written without completesJob: more families may follow
    writer.writeFamily(makeBundle('test-system/B2S1/c', { runId }), { key: 'job:a' });
    expect(writer.jobDone('job:a')).toBe(true);
    expect(writer.jobDone('job:empty')).toBe(false);
    writer.markJobDone({ key: 'job:empty' }, runId);
    expect(writer.jobDone('job:empty')).toBe(true);
    expect(() => writer.markJobDone({ key: 'job:other' }, runId + 9)).toThrow(`markJobDone: runId ${runId + 9} is not in the catalog`);
    expect(writer.jobDone('job:other')).toBe(false);
    writer.close();
    // persisted, and visible to a later writer (what resume does)
    const again = openCatalogForWrite(path);
    expect(again.jobDone('job:a')).toBe(true);
    expect(again.jobDone('job:empty')).toBe(true);
    again.close();
    const db = new Database(path, { readonly: true });
    const rows = db.prepare('SELECT job_key, run_id, done_at FROM jobs ORDER BY job_key').all() as Array<{
      job_key: string;
      run_id: number;
      done_at: string;
    }>;
    expect(rows.map((r) => [r.job_key, r.run_id])).toEqual([
      ['job:a', runId],
      ['job:empty', runId],
    ]);
    for (const row of rows) expect(Number.isNaN(Date.parse(row.done_at))).toBe(false);
    db.close();
  });
});
