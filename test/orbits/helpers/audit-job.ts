// The completeness audit of one lap-signature job: at each audit level inside the job's C range, every
// segment and start direction of the job is scanned independently (audit-scan-tasks.ts), and each orbit
// found is checked against the job's catalogued families (audit-tally.ts). Pure numerics, one thread; the
// run layer (generator/run/audit-catalog.ts) runs the same tasks for all jobs at once, over workers.
import type { StoredFootprint } from '../../../generator/core/orbits/audit-footprint.ts';
import { auditScanTasks, runAuditScanTask, taskLabel } from '../../../generator/core/orbits/audit-scan-tasks.ts';
import type { AuditOrbit, LapSignatureJob } from '../../../generator/core/orbits/audit-scan.ts';
import { JobAuditTally } from '../../../generator/core/orbits/audit-tally.ts';

export interface JobAuditInput {
  job: LapSignatureJob;
  /** Audit levels of the job's system; those outside the job's C range are skipped. */
  levels: readonly number[];
  /** Members of each catalogued family of the job, in family order. */
  families: readonly (readonly StoredFootprint[])[];
  /** Scan grid density relative to the job's (audit-scan.ts). */
  gridFactor: number;
}

export interface JobAuditResult {
  /** Distinct orbits found and checked. */
  orbitsChecked: number;
  /** Found orbits on no catalogued family. */
  misses: AuditOrbit[];
  interrupted: boolean;
}

export interface AuditHooks {
  /** After each scan of one level, segment and direction. */
  onScan?(done: number, total: number, label: string): void;
  shouldStop?(): boolean;
}

export function auditJob(input: JobAuditInput, hooks: AuditHooks = {}): JobAuditResult {
  const { job } = input;
  const tally = new JobAuditTally(job, input.gridFactor, input.families);
  const tasks = auditScanTasks([job], { [job.system.id]: input.levels }, input.gridFactor);
  for (const [index, task] of tasks.entries()) {
    if (hooks.shouldStop?.()) return { orbitsChecked: tally.checked.length, misses: tally.misses, interrupted: true };
    tally.add(runAuditScanTask(task)[0]);
    hooks.onScan?.(index + 1, tasks.length, `${job.key} ${taskLabel(task)}`);
  }
  return { orbitsChecked: tally.checked.length, misses: tally.misses, interrupted: false };
}
