// Every done job keeps the settings its results depend on (jobs.settings, schema version 3): the whole
// job object as the generator got it, read back by jobSettings(); firstSettingDifference names a change.
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { firstSettingDifference, formatSettingDifference } from '../../catalog-db/job-settings.ts';
import { openCatalogForRead, openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import { buildJobs } from '../../generator/config/build-jobs.ts';
import { validateConfig } from '../../generator/config/validate-config.ts';
import { validConfigObject } from '../config/valid-config-object.ts';
import { makeBundle, makeRunInput, makeSystem } from './make-rows.ts';
import { useTempCatalogDir } from './temp-catalog-path.ts';

const catalogPath = useTempCatalogDir();
const jobs = buildJobs(validateConfig(validConfigObject(), 'test.yaml'), 'test.yaml');

describe('jobs.settings', () => {
  it('stores the whole job with writeFamily and markJobDone and reads it back as the generator built it', () => {
    const path = catalogPath('settings.sqlite');
    const writer = openCatalogForWrite(path);
    writer.upsertSystem(makeSystem());
    const runId = writer.startRun(makeRunInput());
    const [withFamily, empty] = [jobs[0]!, jobs[1]!];
    writer.writeFamily(makeBundle('test-system/B2S1/a', { runId }), withFamily);
    writer.markJobDone(empty, runId);
    writer.close();
    const reader = openCatalogForRead(path);
    const stored = reader.jobSettings();
    reader.close();
    expect(stored.map((row) => [row.jobKey, row.runId])).toEqual([[empty.key, runId], [withFamily.key, runId]].sort());
    // JSON round trip of the job object is what is kept (NaN would read back as null, as in any JSON).
    expect(stored.find((row) => row.jobKey === withFamily.key)?.settings).toEqual(JSON.parse(JSON.stringify(withFamily)));
    expect(firstSettingDifference(stored.find((row) => row.jobKey === empty.key)?.settings, empty)).toBeNull();
  });

  it('names the first differing field by its path, with the stored and the given value', () => {
    const job = jobs[0]!;
    const changedMu = { ...job, system: { ...job.system, mu: 0.01215 } };
    const difference = firstSettingDifference(job, changedMu);
    expect(difference).toEqual({ path: 'system.mu', stored: job.system.mu, given: 0.01215 });
    expect(formatSettingDifference(difference!)).toBe(`system.mu (${job.system.mu} → 0.01215)`);
    const seed = job.seed as { jacobiValues: number[] };
    const changedLevel = { ...job, seed: { ...job.seed, jacobiValues: [seed.jacobiValues[0], 3.2] } };
    expect(firstSettingDifference(job, changedLevel)?.path).toBe('seed.jacobiValues[1]');
    const noScreening = { ...job, screening: undefined };
    expect(formatSettingDifference(firstSettingDifference(job, noScreening)!)).toMatch(/^screening \(\{.*→ absent\)$/);
  });

  it('refuses a version-2 catalog (written before jobs kept their settings)', () => {
    const path = catalogPath('v2.sqlite');
    openCatalogForWrite(path).close();
    const raw = new Database(path);
    raw.pragma('user_version = 2');
    raw.close();
    expect(() => openCatalogForRead(path)).toThrow(`catalog ${path} has schema version 2, this cycler-atlas needs 4`);
    expect(() => openCatalogForWrite(path)).toThrow(`catalog ${path} has schema version 2, this cycler-atlas needs 4`);
  });
});
