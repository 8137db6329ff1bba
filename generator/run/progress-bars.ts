// Progress on a terminal: one bar for the jobs of this run and one per running job (its current
// family: members so far of the family's limit, members per second, time left at that rate).
import cliProgress from 'cli-progress';
import type { FamilyJob, JobProgress } from '../core/orbits/family-job.ts';
import { FamilyRate, type ProgressDisplay } from './progress-display.ts';

export function createProgressBars(stream: NodeJS.WriteStream = process.stderr): ProgressDisplay {
  const multibar = new cliProgress.MultiBar(
    {
      stream,
      clearOnComplete: false,
      hideCursor: true,
      gracefulExit: false, // our own SIGINT handler decides what Ctrl-C does
      etaBuffer: 20,
      format: ' {family} |{bar}| {value}/{total} members | {rate}/s | ETA {eta_formatted}',
    },
    cliProgress.Presets.shades_classic,
  );
  let overall: cliProgress.SingleBar | null = null;
  const bars = new Map<string, { bar: cliProgress.SingleBar; label: string; rate: FamilyRate }>();
  return {
    begin(jobsToRun) {
      overall = multibar.create(jobsToRun, 0, {}, { format: ' jobs |{bar}| {value}/{total} done | elapsed {duration_formatted}' });
    },
    progress(job: FamilyJob, progress: JobProgress) {
      const family = `${job.key} ${progress.members === 0 ? 'seed search' : progress.familyLabel}`.padEnd(32);
      let entry = bars.get(job.key);
      if (entry === undefined) {
        entry = { bar: multibar.create(progress.maxMembers, 0, { family, rate: '0.0' }), label: progress.familyLabel, rate: new FamilyRate() };
        bars.set(job.key, entry);
      }
      const rate = entry.rate.update(progress, Date.now()).toFixed(1);
      if (progress.familyLabel !== entry.label) {
        entry.label = progress.familyLabel;
        entry.bar.start(progress.maxMembers, progress.members, { family, rate }); // new family: fresh ETA
      } else {
        entry.bar.update(progress.members, { family, rate });
      }
    },
    jobEnded(job, line) {
      const entry = bars.get(job.key);
      if (entry) {
        multibar.remove(entry.bar);
        bars.delete(job.key);
      }
      overall?.increment();
      multibar.log(`${line}\n`);
    },
    log(line) {
      multibar.log(`${line}\n`);
    },
    end() {
      multibar.stop();
    },
  };
}
