// Progress as plain log lines (no terminal, or output sent to a file): a line when a job starts, when
// it moves on to another family, at most every intervalMs while a family grows, and when it ends.
import type { FamilyJob, JobProgress } from '../core/orbits/family-job.ts';
import { FamilyRate, type ProgressDisplay } from './progress-display.ts';

export function createProgressLines(log: (line: string) => void, intervalMs = 15_000): ProgressDisplay {
  const state = new Map<string, { label: string; lastMs: number; rate: FamilyRate }>();
  let ended = 0;
  let total = 0;
  return {
    begin(jobsToRun) {
      total = jobsToRun;
    },
    progress(job, progress: JobProgress) {
      const now = Date.now();
      let entry = state.get(job.key);
      if (entry === undefined) {
        entry = { label: '', lastMs: now, rate: new FamilyRate() };
        state.set(job.key, entry);
        log(`start ${job.key} (${job.name})`);
      }
      const rate = entry.rate.update(progress, now);
      if (progress.members === 0) return; // still searching for seeds
      if (progress.familyLabel !== entry.label) {
        entry.label = progress.familyLabel;
        entry.lastMs = now;
        log(`  ${job.key}: continuing family ${progress.familyLabel}`);
      } else if (now - entry.lastMs >= intervalMs) {
        entry.lastMs = now;
        log(`  ${job.key}: ${progress.familyLabel} ${progress.members}/${progress.maxMembers} members, ${rate.toFixed(1)} members/s`);
      }
    },
    jobEnded(job, line) {
      ended += 1;
      state.delete(job.key);
      log(`[${ended}/${total}] ${line}`);
    },
    log,
    end() {},
  };
}
