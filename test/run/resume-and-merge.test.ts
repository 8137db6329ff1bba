// Whole-run properties of `generate` on a small config (three short reference families):
// - a run killed with SIGKILL, then started again, gives the same catalog as one uninterrupted run;
// - so does a run stopped with Ctrl-C (SIGINT: exit 130, run row left unfinished), then resumed;
// - the two shards of a 2-way split, merged, equal the unsharded run;
// - verify passes on the resumed catalog.
// The jobs are pure numerics, so the same job gives the same numbers in any worker; "equal" is
// taken as same ids and states to 1e-12.
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import Database from 'better-sqlite3';
import { beforeAll, describe, expect, it } from 'vitest';
import { openCatalogForRead } from '../../catalog-db/open-catalog.ts';
import { mergeCatalogs } from '../../catalog-db/merge-catalogs.ts';
import { generateCatalog } from '../../generator/run/generate-catalog.ts';
import { verifyCatalog } from '../../generator/run/verify-catalog.ts';
import { useTempCatalogDir } from '../catalog-db/temp-catalog-path.ts';
import { expectSameCatalog, jobsDone, snapshotCatalog, type CatalogSnapshot } from './catalog-snapshot.ts';

const repoRoot = fileURLToPath(new URL('../../', import.meta.url));
const configPath = fileURLToPath(new URL('./fixtures/small-catalog.yaml', import.meta.url));
const JOB_COUNT = 3;
const tempPath = useTempCatalogDir();
const quiet = { progress: 'lines' as const, handleSigint: false, log: () => {} };

function startChild(dbPath: string): ChildProcess {
  return spawn(process.execPath, ['--import', 'tsx', 'test/run/generate-child.ts', configPath, dbPath, '1'], {
    cwd: repoRoot,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
}

function exitOf(child: ChildProcess): Promise<{ code: number | null; signal: NodeJS.Signals | null }> {
  return new Promise((resolve) => child.once('exit', (code, signal) => resolve({ code, signal })));
}

/** Number of jobs marked done so far, 0 while the file or its schema is not there yet. */
function doneCount(dbPath: string): number {
  if (!existsSync(dbPath)) return 0;
  try {
    const db = new Database(dbPath, { readonly: true });
    try {
      return db.prepare('SELECT count(*) FROM jobs').pluck().get() as number;
    } finally {
      db.close();
    }
  } catch {
    return 0;
  }
}

describe('generate: resume and shards', () => {
  let reference: CatalogSnapshot;
  const referencePath = tempPath('reference.sqlite');

  beforeAll(async () => {
    const summary = await generateCatalog({ ...quiet, configPath, dbPath: referencePath, workers: 2 });
    expect(summary).toMatchObject({ jobsDone: JOB_COUNT, jobsFailed: [], interrupted: false });
    reference = snapshotCatalog(referencePath);
    expect(reference.families).toHaveLength(JOB_COUNT);
    expect(reference.jobsDone).toHaveLength(JOB_COUNT);
  });

  it('skips every job when run again on a finished catalog', async () => {
    const again = await generateCatalog({ ...quiet, configPath, dbPath: referencePath, workers: 1 });
    expect(again).toMatchObject({ jobsSkipped: JOB_COUNT, jobsDone: 0, familiesWritten: 0 });
    expectSameCatalog(snapshotCatalog(referencePath), reference);
  });

  it('resumes after SIGKILL to the same catalog, and verify passes on it', async () => {
    const dbPath = tempPath('killed.sqlite');
    const child = startChild(dbPath);
    const exited = exitOf(child);
    // Kill as soon as the first job is in the catalog, while the others are still to run.
    await new Promise<void>((resolve, reject) => {
      const timer = setInterval(() => {
        if (doneCount(dbPath) >= 1) {
          clearInterval(timer);
          child.kill('SIGKILL');
          resolve();
        }
      }, 10);
      child.once('exit', () => {
        clearInterval(timer);
        reject(new Error('generate ended before it could be killed'));
      });
    });
    expect((await exited).signal).toBe('SIGKILL');
    const doneBefore = jobsDone(dbPath).length;
    expect(doneBefore).toBeGreaterThanOrEqual(1);
    expect(doneBefore).toBeLessThan(JOB_COUNT); // otherwise the kill came too late to test anything

    const resumed = await generateCatalog({ ...quiet, configPath, dbPath, workers: 1 });
    expect(resumed).toMatchObject({ jobsSkipped: doneBefore, jobsDone: JOB_COUNT - doneBefore, interrupted: false });
    expectSameCatalog(snapshotCatalog(dbPath), reference);

    const report = verifyCatalog(dbPath);
    expect(report.orbitsChecked).toBe(reference.orbits.size);
    expect(report.failures).toEqual([]);
  });

  it('stops cleanly on Ctrl-C (exit 130, run left unfinished) and resumes to the same catalog', async () => {
    const dbPath = tempPath('interrupted.sqlite');
    const child = startChild(dbPath);
    const exited = exitOf(child);
    let output = '';
    child.stdout!.on('data', (chunk: Buffer) => {
      output += chunk.toString();
      // Interrupt while the second family is being continued.
      if (/continuing family retrograde\/a/.test(output) && !child.killed) child.kill('SIGINT');
    });
    const { code } = await exited;
    expect(code).toBe(130);
    expect(output).toMatch(/interrupt: stopping after the current member/);
    const done = jobsDone(dbPath).length;
    expect(done).toBeLessThan(JOB_COUNT);
    const reader = openCatalogForRead(dbPath);
    try {
      expect(reader.runs()[0]!.finishedAt).toBeNull(); // catalog-db/types.ts: null after an interruption
      // The family stopped mid-way is not written (only finished families are), and its job is not done.
      expect(reader.family('earth-moon/retrograde/a')).toBeUndefined();
      expect(jobsDone(dbPath)).not.toContain('earth-moon:retrograde-70000km');
    } finally {
      reader.close();
    }

    const resumed = await generateCatalog({ ...quiet, configPath, dbPath, workers: 2 });
    expect(resumed).toMatchObject({ jobsSkipped: done, jobsDone: JOB_COUNT - done, interrupted: false });
    expectSameCatalog(snapshotCatalog(dbPath), reference);
  });

  it('merges the two shards of a 2-way split into the unsharded catalog', async () => {
    const shardPaths = [tempPath('shard-1.sqlite'), tempPath('shard-2.sqlite')];
    // Both shards at once, as on two machines (one worker each).
    const summaries = await Promise.all(
      shardPaths.map((dbPath, index) => generateCatalog({ ...quiet, configPath, dbPath, workers: 1, shard: { k: index + 1, n: 2 } })),
    );
    expect(summaries.map((s) => s.jobsInShard)).toEqual([2, 1]); // jobs 0 and 2, then job 1
    const mergedPath = tempPath('merged.sqlite');
    mergeCatalogs(mergedPath, shardPaths);
    expectSameCatalog(snapshotCatalog(mergedPath), reference);
    const reader = openCatalogForRead(mergedPath);
    try {
      expect(reader.runs().map((r) => r.shard).sort()).toEqual(['1/2', '2/2']);
      expect(reader.scenario()?.name).toBe('Run-layer test');
    } finally {
      reader.close();
    }
  });
});
