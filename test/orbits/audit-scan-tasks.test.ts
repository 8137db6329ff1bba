// The audit's scan tasks: one per system, level, segment and direction, serving exactly the jobs that scan
// there (inside their C range), the job with most half crossings first; sharing the screen of the scan's
// roots among a task's jobs gives each job what its own scan gives (common practice: a cache must not
// change results).
import { describe, expect, it } from 'vitest';
import { auditScanTasks, runAuditScanTask } from '../../generator/core/orbits/audit-scan-tasks.ts';
import { auditContext, auditScan, type LapSignatureJob } from '../../generator/core/orbits/audit-scan.ts';
import { E1M1_JOB } from './helpers/earth-moon-jobs.ts';

const e1m1 = E1M1_JOB as LapSignatureJob; // far-primary, ẏ0 < 0, one half crossing
const e2m1: LapSignatureJob = {
  ...e1m1, key: 'test:E2M1',
  seed: { ...e1m1.seed, signature: 'E2M1', segments: ['far-primary', 'between'], directions: [1, -1], maxHalfCrossings: 2 },
  limits: { ...e1m1.limits, jacobiMin: 3.04, jacobiMax: 3.3 },
};

describe('auditScanTasks', () => {
  it('groups the jobs that scan each level, segment and direction, most half crossings first', () => {
    const tasks = auditScanTasks([e1m1, e2m1], { 'earth-moon': [3.0, 3.046] }, 4);
    const summary = tasks.map((t) => [t.jacobi, t.segment, t.direction, t.jobs.map((j) => j.key)]);
    // C = 3.0 is below E2M1's range; E1M1 scans only the far side of the Earth with ẏ0 < 0.
    expect(summary).toEqual([
      [3.0, 'far-primary', -1, ['test:E1M1']],
      [3.046, 'far-primary', 1, ['test:E2M1']],
      [3.046, 'far-primary', -1, ['test:E2M1', 'test:E1M1']],
      [3.046, 'between', 1, ['test:E2M1']],
      [3.046, 'between', -1, ['test:E2M1']],
    ]);
  });

  it('gives each job of a task the orbits its own scan finds', () => {
    const [task] = auditScanTasks([e1m1, e2m1], { 'earth-moon': [3.046] }, 4).filter((t) => t.jobs.length === 2);
    const shared = runAuditScanTask(task);
    const alone = task.jobs.map((job) => auditScan(auditContext(job, 4), task.jacobi, task.segment, task.direction));
    expect(shared).toEqual(alone);
    expect(shared[1].length).toBeGreaterThan(0); // the E1M1 family crosses C = 3.046 (earth-moon-jobs.ts)
  });
});
