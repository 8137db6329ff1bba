// What the main thread shows while jobs run. On a terminal: live bars (progress-bars.ts); otherwise
// plain log lines (progress-lines.ts). Both get the same events.
import type { FamilyJob, JobProgress } from '../core/orbits/family-job.ts';

export interface ProgressDisplay {
  /** Number of jobs this run will actually compute (after shard selection and resume). */
  begin(jobsToRun: number): void;
  progress(job: FamilyJob, progress: JobProgress): void;
  /** The job ended (written, failed or interrupted); line summarises it. */
  jobEnded(job: FamilyJob, line: string): void;
  /** A message that must not be garbled by the bars. */
  log(line: string): void;
  end(): void;
}

/** Members per second of the family in progress, from when its first member was reported. */
export class FamilyRate {
  private label = '';
  private startMs = 0;
  private startMembers = 0;

  update(progress: JobProgress, nowMs: number): number {
    if (progress.familyLabel !== this.label || progress.members < this.startMembers) {
      this.label = progress.familyLabel;
      this.startMs = nowMs;
      this.startMembers = progress.members;
    }
    const seconds = (nowMs - this.startMs) / 1000;
    return seconds > 0 ? (progress.members - this.startMembers) / seconds : 0;
  }
}
