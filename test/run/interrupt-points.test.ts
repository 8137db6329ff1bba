// A job is done only when it has really finished. A generate run on a small lap-signature config is
// stopped with SIGINT or SIGKILL at several points of a job — during the discovery grid, while a family
// is continued, while its stable members are screened, and after its first family is written — then run
// again to the end; every resumed catalog must equal one uninterrupted run (families, orbit states to
// 1e-12, windows, done jobs), a stop never leaves a job marked done early, and the resumed run goes on
// under the stopped run's row instead of leaving it unfinished. Common practice for
// crash-safe batch jobs: commit each finished unit, mark the whole done last, resume after the units.
import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { openCatalogForRead } from '../../catalog-db/open-catalog.ts';
import { generateCatalog } from '../../generator/run/generate-catalog.ts';
import { useTempCatalogDir } from '../catalog-db/temp-catalog-path.ts';
import { expectSameCatalog, jobsDone, snapshotCatalog, type CatalogSnapshot } from './catalog-snapshot.ts';

const repoRoot = fileURLToPath(new URL('../../', import.meta.url));
const configPath = fileURLToPath(new URL('./fixtures/small-discovery.yaml', import.meta.url));
const tempPath = useTempCatalogDir();
const quiet = { progress: 'lines' as const, handleSigint: false, log: () => {} };

/** Runs generate in a child and sends `signal` once a line of its output matches `when` (after delayMs). */
function stopChildAt(dbPath: string, when: RegExp, signal: NodeJS.Signals, delayMs: number): Promise<{ code: number | null; output: string }> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'test/run/generate-child.ts', configPath, dbPath, '1'], {
    cwd: repoRoot, stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  let sent = false;
  const watch = (chunk: Buffer) => {
    output += chunk.toString();
    if (!sent && when.test(output)) {
      sent = true;
      setTimeout(() => child.kill(signal), delayMs);
    }
  };
  child.stdout!.on('data', watch);
  child.stderr!.on('data', watch);
  return new Promise((resolve) => child.once('exit', (code) => resolve({ code, output })));
}

describe('generate: stopped at any point of a job, resumed to the same catalog', () => {
  let reference: CatalogSnapshot;

  beforeAll(async () => {
    const referencePath = tempPath('reference.sqlite');
    const summary = await generateCatalog({ ...quiet, configPath, dbPath: referencePath, workers: 1 });
    expect(summary).toMatchObject({ jobsDone: 2, jobsFailed: [], interrupted: false });
    reference = snapshotCatalog(referencePath);
    expect(reference.families.length).toBeGreaterThanOrEqual(2);
    expect(reference.families.some((f) => f.windows > 0)).toBe(true); // the screening stage is reached
  });

  const points: Array<[string, RegExp, NodeJS.Signals, number]> = [
    ['during the discovery grid', /^run \d+:/m, 'SIGINT', 150],
    ['during the discovery grid', /^run \d+:/m, 'SIGKILL', 300],
    ['while a family is continued', /continuing family E1M1\/a$/m, 'SIGINT', 0],
    ['while stable members are screened', /E1M1\/a screening/, 'SIGINT', 0],
    ['after the first family is written', /continuing family E1M1\/b$/m, 'SIGKILL', 0],
    ['in the second job', /continuing family E2M1\/a$/m, 'SIGKILL', 50],
  ];

  it.each(points)('%s (%s)', async (_what, when, signal, delayMs) => {
    const dbPath = tempPath(`stopped-${signal}-${delayMs}-${when.source.length}.sqlite`);
    const stopped = await stopChildAt(dbPath, when, signal, delayMs);
    expect(when.test(stopped.output), stopped.output).toBe(true);
    if (signal === 'SIGINT') expect(stopped.code).toBe(130);
    // Whatever was stopped is not marked done: at most the jobs that had ended before the stop.
    const endedBefore = (stopped.output.match(/^\[\d+\/\d+\] done /gm) ?? []).length;
    expect(jobsDone(dbPath).length).toBeLessThanOrEqual(endedBefore);
    expect(jobsDone(dbPath).length).toBeLessThan(2);
    const resumed = await generateCatalog({ ...quiet, configPath, dbPath, workers: 1 });
    expect(resumed.interrupted).toBe(false);
    expectSameCatalog(snapshotCatalog(dbPath), reference);
    // The resumed run went on under the stopped run's row: one run, finished.
    const reader = openCatalogForRead(dbPath);
    try {
      expect(reader.runs().map((r) => r.finishedAt !== null)).toEqual([true]);
    } finally {
      reader.close();
    }
  });
});
