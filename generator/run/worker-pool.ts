// A pool of worker threads (tinypool) running FamilyJobs and discovery grids, with per-task messages
// and a shared stop flag.
import { availableParallelism } from 'node:os';
import { MessageChannel } from 'node:worker_threads';
import { Tinypool } from 'tinypool';
import type { FamilyBundle } from '../../catalog-db/types.ts';
import type { DiscoveryRequest, DiscoveryResult } from '../core/orbits/discovery/discover-candidates.ts';
import type { FamilyJob, JobInputs, JobProgress, JobResult } from '../core/orbits/family-job.ts';
import type { DiscoveryTask, FamilyTask, WorkerMessage } from './family-worker.ts';

export interface JobHandlers {
  onProgress(progress: JobProgress): void;
  /** A finished family, as soon as the worker has it (the run layer writes it at once). */
  onFamily?(bundle: FamilyBundle): void;
}

export interface FamilyPool {
  readonly threads: number;
  run(job: FamilyJob, handlers: JobHandlers | ((progress: JobProgress) => void), inputs?: JobInputs): Promise<JobResult>;
  /** One discovery grid; onGrid gets the grid points done so far after each Jacobi level. */
  discover(request: DiscoveryRequest, onGrid: (pointsDone: number, points: number) => void): Promise<DiscoveryResult>;
  /** Running tasks stop after their current member or grid level; queued jobs return at once without work. */
  requestStop(): void;
  destroy(): Promise<void>;
}

/** How long a finished task's last messages may lag behind its result before the port is closed anyway. */
const END_MESSAGE_WAIT_MS = 5_000;

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
  const send = async <T>(task: Omit<FamilyTask, 'progressPort' | 'stopFlag'> | Omit<DiscoveryTask, 'progressPort' | 'stopFlag'>, onMessage: (m: WorkerMessage) => void): Promise<T> => {
    const channel = new MessageChannel();
    // The task's result comes back on tinypool's own channel and can overtake the last messages on this
    // port: the worker's 'end' message, its last one, tells when every message has been handled.
    let ended!: () => void;
    const allHandled = new Promise<void>((resolve) => { ended = resolve; });
    channel.port1.on('message', (m: WorkerMessage) => (m.type === 'end' ? ended() : onMessage(m)));
    const full = { ...task, progressPort: channel.port2, stopFlag };
    try {
      const result = (await pool.run(full, { transferList: [channel.port2] })) as T;
      await Promise.race([allHandled, new Promise((resolve) => setTimeout(resolve, END_MESSAGE_WAIT_MS))]);
      return result;
    } finally {
      channel.port1.close();
    }
  };
  return {
    threads,
    run(job, handlers, inputs = {}) {
      const { onProgress, onFamily } = typeof handlers === 'function' ? { onProgress: handlers, onFamily: undefined } : handlers;
      // A handler that throws (a family that cannot be written, e.g. on a full disk) fails this job once
      // it ends, instead of escaping from the message listener as an uncaught exception.
      let failure: { error: unknown } | undefined;
      const result = send<JobResult>({ kind: 'family', job, inputs }, (m) => {
        try {
          if (m.type === 'progress') onProgress(m.progress);
          else if (m.type === 'family') onFamily?.(m.bundle);
        } catch (error) {
          failure ??= { error };
        }
      });
      return result.then((value) => {
        if (failure !== undefined) throw failure.error;
        return value;
      });
    },
    discover(request, onGrid) {
      return send<DiscoveryResult>({ kind: 'discovery', request }, (m) => {
        if (m.type === 'grid') onGrid(m.pointsDone, m.points);
      });
    },
    requestStop() {
      Atomics.store(stopFlag, 0, 1);
    },
    destroy: () => pool.destroy(),
  };
}
