// The worker pool loads the TypeScript worker in plain Node worker threads (tsx registered by the
// .mjs entry), reports progress per member and stops a running job on the shared flag.
import { afterAll, describe, expect, it } from 'vitest';
import { buildJobs } from '../../generator/config/build-jobs.ts';
import { singleFamilyConfig } from '../../generator/config/single-family-config.ts';
import type { FamilyJob, JobProgress } from '../../generator/core/orbits/family-job.ts';
import { createFamilyPool, type FamilyPool } from '../../generator/run/worker-pool.ts';

function lyapunovJob(point: 'L1' | 'L2', maxMembers: number): FamilyJob {
  const loaded = singleFamilyConfig({ system: 'earth-moon', lyapunov: point, maxMembers });
  return buildJobs(loaded.config, loaded.configPath)[0]!;
}

describe('createFamilyPool', () => {
  const pools: FamilyPool[] = [];
  afterAll(async () => {
    await Promise.all(pools.map((p) => p.destroy()));
  });

  it('runs a job in a worker thread and passes its progress back', async () => {
    const pool = createFamilyPool(1);
    pools.push(pool);
    const progress: JobProgress[] = [];
    const result = await pool.run(lyapunovJob('L1', 10), (p) => progress.push(p));
    expect(result.interrupted).toBe(false);
    expect(result.bundles).toHaveLength(1);
    const members = result.bundles[0]!.orbits.length;
    expect(members).toBeGreaterThanOrEqual(10);
    // First message: the job left the queue (members 0); then the count grows to the family's size.
    expect(progress[0]).toMatchObject({ jobKey: 'earth-moon:L1-lyapunov', members: 0 });
    const counts = progress.slice(1).map((p) => p.members);
    expect(counts.every((c, i) => i === 0 || c >= counts[i - 1]!)).toBe(true);
    expect(counts.at(-1)).toBe(members);
  });

  it('stops a running job after its current member when asked', async () => {
    const pool = createFamilyPool(1);
    pools.push(pool);
    const maxMembers = 200;
    let asked = false;
    const result = await pool.run(lyapunovJob('L2', maxMembers), (p) => {
      if (!asked && p.members >= 5) {
        asked = true;
        pool.requestStop();
      }
    });
    expect(asked).toBe(true);
    expect(result.interrupted).toBe(true);
    // The family was not finished, so it does not leave the job (a resumed run computes it again).
    expect(result.bundles).toHaveLength(0);
    // A job that starts after the stop does no work at all.
    const late = await pool.run(lyapunovJob('L1', 10), () => {});
    expect(late).toEqual({ bundles: [], interrupted: true });
  });
});
