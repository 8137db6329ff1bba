// Worker-thread side of the audit's scan tasks (audit-task-runner.ts): one task per call, nothing once
// the audit has been asked to stop.
import { runAuditScanTask, type AuditScanTask } from '../core/orbits/audit-scan-tasks.ts';
import type { AuditOrbit } from '../core/orbits/audit-scan.ts';

export interface AuditWorkerTask {
  task: AuditScanTask;
  /** Shared with the main thread: non-zero once the audit stops. */
  stopFlag: Int32Array;
}

export default function runAuditWorkerTask({ task, stopFlag }: AuditWorkerTask): AuditOrbit[][] | null {
  return Atomics.load(stopFlag, 0) !== 0 ? null : runAuditScanTask(task);
}
