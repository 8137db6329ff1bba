// Runs in a worker thread: one FamilyJob per task. Progress goes back on the task's own port; the
// shared stop flag (set by the main thread on Ctrl-C) is polled between members by runFamilyJob.
import type { MessagePort } from 'node:worker_threads';
import type { FamilyJob, JobResult } from '../core/orbits/family-job.ts';
import { runFamilyJob } from '../core/orbits/run-family-job.ts';

export interface FamilyTask {
  job: FamilyJob;
  progressPort: MessagePort;
  /** Int32Array over a SharedArrayBuffer; non-zero means "stop after the current member". */
  stopFlag: Int32Array;
}

export default function runFamilyTask(task: FamilyTask): JobResult {
  const { job, progressPort, stopFlag } = task;
  const shouldStop = () => Atomics.load(stopFlag, 0) !== 0;
  try {
    // A queued job that starts after Ctrl-C does nothing (and is not marked done).
    if (shouldStop()) return { bundles: [], interrupted: true };
    // Members 0 tells the main thread the job has left the queue (seed search under way).
    progressPort.postMessage({ jobKey: job.key, familyLabel: '', familiesDone: 0, members: 0, maxMembers: job.limits.maxMembers });
    return runFamilyJob(job, { onProgress: (progress) => progressPort.postMessage(progress), shouldStop });
  } finally {
    progressPort.close();
  }
}
