// `audit`: the completeness check of a catalog. Reads the lap-signature jobs and their families, draws
// the audit levels, runs the scan tasks of all jobs (core/orbits/audit-scan-tasks.ts; on worker threads
// if asked) with progress on stderr and a clean stop on Ctrl-C, tallies each job's orbits against its
// families (audit-tally.ts) and stores a finished audit in the catalog's audits table. An interrupted
// audit is not stored: the catalog stays as it was.
import type { AuditMiss, AuditRow } from '../../catalog-db/audit-types.ts';
import { openCatalogForRead, openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import type { FamilyRow } from '../../catalog-db/types.ts';
import { storedOrbitFootprint, type StoredFootprint } from '../core/orbits/audit-footprint.ts';
import { auditScanTasks, taskLabel } from '../core/orbits/audit-scan-tasks.ts';
import type { AuditOrbit, LapSignatureJob } from '../core/orbits/audit-scan.ts';
import { JobAuditTally } from '../core/orbits/audit-tally.ts';
import { auditLevelsOfCatalog } from './audit-levels-of-catalog.ts';
import { lapSignatureJobsOf } from './audit-jobs-of-catalog.ts';
import { createAuditTaskRunner } from './audit-task-runner.ts';
import { createRateProgress } from './rate-progress.ts';

export interface AuditOptions {
  dbPath: string;
  levelsPerSystem: number;
  seed: number;
  /** Scan grid density relative to each job's (default DEFAULT_GRID_FACTOR). */
  gridFactor?: number;
  /** Worker threads for the scans (default 1: this thread). */
  workers?: number;
  log?: (line: string) => void;
  shouldStop?: () => boolean;
}

/** Four times the job's start points: fine enough to split the close root pairs a job's grid can miss. */
export const DEFAULT_GRID_FACTOR = 4;

export interface AuditReport extends Omit<AuditRow, 'id'> {
  interrupted: boolean;
  /** Id of the stored audit row (absent when interrupted). */
  auditId?: number;
}

interface JobWork {
  job: LapSignatureJob;
  families: StoredFootprint[][];
}

function missOf(job: LapSignatureJob, orbit: AuditOrbit): AuditMiss {
  return {
    jobKey: job.key, systemId: job.system.id, signature: job.seed.signature, segment: orbit.segment,
    direction: orbit.direction, halfCrossings: orbit.halfCrossings, jacobi: orbit.jacobi, periodNd: orbit.periodNd,
    state0: [orbit.x0, 0, 0, 0, orbit.vy0, 0], xHalf: orbit.xHalf,
  };
}

/** A job's families: those it wrote, and any of its signature and system another job continued into. */
function familiesOf(job: LapSignatureJob, families: readonly FamilyRow[]): FamilyRow[] {
  return families.filter((f) => f.configKey === job.key || (f.systemId === job.system.id && f.signature === job.seed.signature));
}

/** Each job with the footprints of its families' stored members (one half-period propagation each). */
function readJobWork(dbPath: string, log: (line: string) => void, shouldStop?: () => boolean): JobWork[] | null {
  const reader = openCatalogForRead(dbPath);
  try {
    const jobs = lapSignatureJobsOf(reader.jobSettings());
    const families = reader.families();
    const work = jobs.map((job) => ({ job, families: [] as StoredFootprint[][] }));
    const total = work.reduce((sum, w) => sum + familiesOf(w.job, families).reduce((n, f) => n + f.memberCount, 0), 0);
    const progress = createRateProgress('audit: stored members measured', total, log);
    let done = 0;
    for (const entry of work) {
      for (const family of familiesOf(entry.job, families)) {
        if (shouldStop?.()) return null;
        entry.families.push(reader.orbits(family.id).map((o) => storedOrbitFootprint(entry.job.system.mu, o.state0, o.period, entry.job.tolerance)));
        done += family.memberCount;
        progress.step(done, family.id);
      }
    }
    return work;
  } finally {
    reader.close();
  }
}

export async function auditCatalog(options: AuditOptions): Promise<AuditReport> {
  const startMs = Date.now();
  const gridFactor = options.gridFactor ?? DEFAULT_GRID_FACTOR;
  const log = options.log ?? ((line: string) => process.stderr.write(`${line}\n`));
  const row = (found: Pick<AuditRow, 'levels' | 'jobsAudited' | 'orbitsChecked' | 'misses'>): Omit<AuditRow, 'id'> => ({
    finishedAt: new Date().toISOString(), seconds: (Date.now() - startMs) / 1000, seed: options.seed,
    levelsPerSystem: options.levelsPerSystem, gridFactor, ...found,
  });
  const work = readJobWork(options.dbPath, log, options.shouldStop);
  if (work === null) return { ...row({ levels: {}, jobsAudited: 0, orbitsChecked: 0, misses: [] }), interrupted: true };
  const levels = auditLevelsOfCatalog(work.map((w) => w.job), options.levelsPerSystem, options.seed);
  const tasks = auditScanTasks(work.map((w) => w.job), levels, gridFactor);
  const tallies = new Map(work.map((w) => [w.job.key, new JobAuditTally(w.job, gridFactor, w.families)]));
  const runner = createAuditTaskRunner(Math.max(1, Math.min(options.workers ?? 1, tasks.length)));
  const progress = createRateProgress('audit: scans (level × segment × direction)', tasks.length, log);
  const poll = setInterval(() => options.shouldStop?.() && runner.stop(), 100);
  let interrupted = false;
  let done = 0;
  const results = tasks.map((task) => runner.run(task).then((found) => {
    if (found) progress.step(++done, taskLabel(task));
    // Asked again after each scan too: scans shorter than the poll interval would otherwise never hear it.
    if (options.shouldStop?.()) runner.stop();
    return found;
  }));
  try {
    // Tallied in task order, so that the same seed gives the same audit whatever the timing.
    for (const [index, result] of results.entries()) {
      const found = await result;
      if (found === null) {
        interrupted = true;
        continue;
      }
      tasks[index].jobs.forEach((job, j) => tallies.get(job.key)!.add(found[j]));
    }
  } catch (error) {
    // The tasks still queued or running would fail with the pool's shutdown: only this error counts.
    runner.stop();
    for (const result of results) result.catch(() => undefined);
    throw error;
  } finally {
    clearInterval(poll);
    await runner.destroy();
  }
  const jobTallies = [...tallies.values()];
  const audit = row({
    levels, jobsAudited: work.length,
    orbitsChecked: jobTallies.reduce((sum, t) => sum + t.checked.length, 0),
    misses: jobTallies.flatMap((t) => t.misses.map((orbit) => missOf(t.job, orbit))),
  });
  if (interrupted) return { ...audit, interrupted };
  const writer = openCatalogForWrite(options.dbPath);
  try {
    return { ...audit, interrupted, auditId: writer.writeAudit(audit) };
  } finally {
    writer.close();
  }
}
