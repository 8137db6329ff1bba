// The audit's scans as independent tasks (one Jacobi level, segment and start direction of one system),
// each serving every lap-signature job of the system that scans there: the x-axis scan is the costly
// part and the same for all of them, so it runs once per task (cached-scan.ts) and the run layer can
// spread tasks over worker threads.
import { auditContext, auditScan, type AuditOrbit, type LapSignatureJob, type ScreenCache } from './audit-scan.ts';
import type { AxisSegment } from './family-job.ts';

export interface AuditScanTask {
  /** Jobs of one system that scan this level, segment and direction, most half crossings first. */
  jobs: LapSignatureJob[];
  jacobi: number;
  segment: AxisSegment;
  direction: 1 | -1;
  gridFactor: number;
}

export function levelsInRange(job: LapSignatureJob, levels: readonly number[]): number[] {
  return levels.filter((c) => c >= job.limits.jacobiMin && c <= job.limits.jacobiMax);
}

const SEGMENT_ORDER: readonly AxisSegment[] = ['far-primary', 'between', 'far-secondary'];

/** Tasks in a fixed order (system, level, segment, direction), so that an audit's result does not depend on timing. */
export function auditScanTasks(jobs: readonly LapSignatureJob[], levels: Readonly<Record<string, readonly number[]>>, gridFactor: number): AuditScanTask[] {
  const tasks: AuditScanTask[] = [];
  // A scan with more crossings answers a later request for fewer (cached-scan.ts).
  const ordered = [...jobs].sort((a, b) => b.seed.maxHalfCrossings - a.seed.maxHalfCrossings);
  for (const systemId of Object.keys(levels).sort()) {
    for (const jacobi of levels[systemId]) {
      for (const segment of SEGMENT_ORDER) {
        for (const direction of [1, -1] as const) {
          const serving = ordered.filter((job) => job.system.id === systemId && job.seed.segments.includes(segment)
            && job.seed.directions.includes(direction) && levelsInRange(job, [jacobi]).length === 1);
          if (serving.length > 0) tasks.push({ jobs: serving, jacobi, segment, direction, gridFactor });
        }
      }
    }
  }
  return tasks;
}

/** The orbits each of the task's jobs must find in the catalog, in the order of task.jobs. */
export function runAuditScanTask(task: AuditScanTask): AuditOrbit[][] {
  const screens: ScreenCache = new Map();
  return task.jobs.map((job) => auditScan(auditContext(job, task.gridFactor), task.jacobi, task.segment, task.direction, screens));
}

export function taskLabel(task: AuditScanTask): string {
  return `${task.jobs[0].system.id} C=${task.jacobi.toFixed(6)} ${task.segment} ${task.direction > 0 ? '+' : '-'}`;
}
