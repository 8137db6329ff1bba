// Runs in a worker thread: one task at a time, either a FamilyJob or one discovery grid (a segment and
// start direction of a system, shared by all its lap-signature jobs). Messages go back on the task's own
// port (progress, finished families, grid points done); the shared stop flag (set by the main thread on
// Ctrl-C) is polled between members and between grid levels.
import type { MessagePort } from 'node:worker_threads';
import type { FamilyBundle } from '../../catalog-db/types.ts';
import { discoverCandidates, type DiscoveryRequest, type DiscoveryResult } from '../core/orbits/discovery/discover-candidates.ts';
import type { FamilyJob, JobInputs, JobProgress, JobResult } from '../core/orbits/family-job.ts';
import { runFamilyJob } from '../core/orbits/run-family-job.ts';

export type WorkerMessage =
  | { type: 'progress'; progress: JobProgress }
  | { type: 'family'; bundle: FamilyBundle }
  | { type: 'grid'; pointsDone: number; points: number }
  /** The task's last message: everything before it has been posted. */
  | { type: 'end' };

interface TaskBase {
  progressPort: MessagePort;
  /** Int32Array over a SharedArrayBuffer; non-zero means "stop after the current member". */
  stopFlag: Int32Array;
}

export interface FamilyTask extends TaskBase {
  kind: 'family';
  job: FamilyJob;
  inputs: JobInputs;
}

export interface DiscoveryTask extends TaskBase {
  kind: 'discovery';
  request: DiscoveryRequest;
}

export default function runWorkerTask(task: FamilyTask | DiscoveryTask): JobResult | DiscoveryResult {
  const { progressPort, stopFlag } = task;
  const shouldStop = () => Atomics.load(stopFlag, 0) !== 0;
  const post = (message: WorkerMessage) => progressPort.postMessage(message);
  try {
    if (task.kind === 'discovery') {
      return discoverCandidates(task.request, { shouldStop, onLevel: (pointsDone, points) => post({ type: 'grid', pointsDone, points }) });
    }
    const { job } = task;
    // A queued job that starts after Ctrl-C does nothing (and is not marked done).
    if (shouldStop()) return { bundles: [], interrupted: true };
    // Members 0 tells the main thread the job has left the queue (seed search under way).
    post({ type: 'progress', progress: { jobKey: job.key, familyLabel: '', familiesDone: 0, members: 0, maxMembers: job.limits.maxMembers } });
    return runFamilyJob(job, {
      onProgress: (progress) => post({ type: 'progress', progress }),
      onFamily: (bundle) => post({ type: 'family', bundle }),
      shouldStop,
    }, task.inputs);
  } finally {
    post({ type: 'end' });
    progressPort.close();
  }
}
