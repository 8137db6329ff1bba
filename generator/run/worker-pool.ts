// A pool of worker threads (tinypool) running FamilyJobs, with per-job progress and a shared stop flag.
import { availableParallelism } from 'node:os';
import { MessageChannel } from 'node:worker_threads';
import { Tinypool } from 'tinypool';
import type { FamilyJob, JobProgress, JobResult } from '../core/orbits/family-job.ts';
import type { FamilyTask } from './family-worker.ts';

export interface FamilyPool {
  readonly threads: number;
  run(job: FamilyJob, onProgress: (progress: JobProgress) => void): Promise<JobResult>;
  /** Running jobs stop after their current member; queued jobs return at once without work. */
  requestStop(): void;
  destroy(): Promise<void>;
}

export function defaultWorkerCount(): number {
  return availableParallelism();
}

export function createFamilyPool(threads: number): FamilyPool {
  const stopFlag = new Int32Array(new SharedArrayBuffer(Int32Array.BYTES_PER_ELEMENT));
  const pool = new Tinypool({
    filename: new URL('./family-worker-entry.mjs', import.meta.url).href,
    minThreads: threads,
    maxThreads: threads,
    // Workers are reused across jobs: each keeps its integrator workspaces warm.
    idleTimeout: 60_000,
  });
  return {
    threads,
    run(job, onProgress) {
      const channel = new MessageChannel();
      channel.port1.on('message', (progress: JobProgress) => onProgress(progress));
      const task: FamilyTask = { job, progressPort: channel.port2, stopFlag };
      return (pool.run(task, { transferList: [channel.port2] }) as Promise<JobResult>).finally(() => channel.port1.close());
    },
    requestStop() {
      Atomics.store(stopFlag, 0, 1);
    },
    destroy: () => pool.destroy(),
  };
}
