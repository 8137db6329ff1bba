// Runs the audit's scan tasks: on worker threads (tinypool), or in this thread for one worker, yielding
// to the event loop between tasks so that Ctrl-C is heard. stop() makes every task not yet started
// return null.
import { Tinypool } from 'tinypool';
import { runAuditScanTask, type AuditScanTask } from '../core/orbits/audit-scan-tasks.ts';
import type { AuditOrbit } from '../core/orbits/audit-scan.ts';
import type { AuditWorkerTask } from './audit-worker.ts';

export interface AuditTaskRunner {
  run(task: AuditScanTask): Promise<AuditOrbit[][] | null>;
  stop(): void;
  destroy(): Promise<void>;
}

function inThisThread(): AuditTaskRunner {
  let stopped = false;
  let queue: Promise<unknown> = Promise.resolve();
  return {
    run(task) {
      const result = queue.then(async () => {
        await new Promise((resolve) => setImmediate(resolve)); // let signal handlers run
        return stopped ? null : runAuditScanTask(task);
      });
      queue = result;
      return result;
    },
    stop: () => { stopped = true; },
    destroy: async () => {},
  };
}

function onWorkers(threads: number): AuditTaskRunner {
  const stopFlag = new Int32Array(new SharedArrayBuffer(Int32Array.BYTES_PER_ELEMENT));
  const pool = new Tinypool({ filename: new URL('./audit-worker-entry.mjs', import.meta.url).href, minThreads: threads, maxThreads: threads });
  return {
    run: (task) => pool.run({ task, stopFlag } satisfies AuditWorkerTask) as Promise<AuditOrbit[][] | null>,
    stop: () => Atomics.store(stopFlag, 0, 1),
    destroy: () => pool.destroy(),
  };
}

export function createAuditTaskRunner(threads: number): AuditTaskRunner {
  return threads <= 1 ? inThisThread() : onWorkers(threads);
}
