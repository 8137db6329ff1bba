// `generate`: runs the jobs of a catalog config on a worker pool and writes what they yield.
// Provenance goes into a run row; finished jobs are skipped (resume); this shard's jobs only.
import { openCatalogForRead, openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import type { CatalogWriter, RunRow } from '../../catalog-db/types.ts';
import { buildJobs, configSystems } from '../config/build-jobs.ts';
import { loadConfig, type LoadedConfig } from '../config/load-config.ts';
import type { FamilyJob } from '../core/orbits/family-job.ts';
import { handleInterrupts } from './interrupt-handler.ts';
import { createProgressBars } from './progress-bars.ts';
import type { ProgressDisplay } from './progress-display.ts';
import { createProgressLines } from './progress-lines.ts';
import { generatorVersion, gitCommit, sha256Hex } from './run-provenance.ts';
import { orderJobsByCost } from './order-jobs-by-cost.ts';
import { settleSettingsChanges } from './settings-changes.ts';
import { formatShard, selectShard, type Shard } from './shard.ts';
import { createFamilyPool, defaultWorkerCount, type FamilyPool } from './worker-pool.ts';
import { createJobWriter } from './write-job-result.ts';
import { assertWorkWithinBound } from './work-estimate.ts';
import { sharedDiscoveryGrids, startSharedDiscovery } from './shared-discovery.ts';
import { storedFamiliesOfJob } from './stored-families-of-job.ts';
import { linkSignatureChanges } from './link-signature-changes.ts';

export interface GenerateOptions {
  dbPath: string;
  /** Start even when the discovery work is above the bound of work-estimate.ts. */
  force?: boolean;
  /** Worker threads; default one per core (never more than there are jobs to run). */
  workers?: number;
  shard?: Shard;
  log?: (line: string) => void;
  /** 'auto': bars on a terminal, lines otherwise. */
  progress?: 'auto' | 'bars' | 'lines';
  /** Install the Ctrl-C handler (default true; tests turn it off). */
  handleSigint?: boolean;
  /** 'set' (a config run) replaces the catalog's scenario; 'if-missing' (one family from the command line) keeps it. */
  scenario?: 'set' | 'if-missing';
  /** Delete and recompute the families whose system constants or job settings the config changes (else refused). */
  recomputeChanged?: boolean;
}

export interface GenerateSummary {
  runId: number;
  jobsInShard: number;
  jobsSkipped: number; // already done (resume)
  jobsDone: number; // finished in this run
  jobsFailed: Array<{ key: string; message: string }>;
  familiesWritten: number;
  membersWritten: number;
  interrupted: boolean;
  seconds: number;
  workers: number;
  /** Wall-clock seconds of each job run here, from leaving the queue to being written. */
  jobSeconds: Record<string, number>;
}

export async function generateCatalog(options: GenerateOptions & { configPath: string }): Promise<GenerateSummary> {
  return generateFromConfig(loadConfig(options.configPath), options);
}

export async function generateFromConfig(loaded: LoadedConfig, options: GenerateOptions): Promise<GenerateSummary> {
  const startMs = Date.now();
  const log = options.log ?? ((line: string) => console.log(line));
  const shard = options.shard ?? { k: 1, n: 1 };
  const { config, configPath, text } = loaded;
  const jobs = selectShard(buildJobs(config, configPath), shard);
  const configHash = sha256Hex(text);
  // Before the catalog is opened: a refused run changes nothing.
  assertWorkWithinBound(jobs, options.force === true);

  const writer = openCatalogForWrite(options.dbPath);
  try {
    const systems = configSystems(config);
    settleSettingsChanges({ writer, dbPath: options.dbPath, configPath, systems, jobs, configHash, recompute: options.recomputeChanged === true, log });
    for (const system of systems) writer.upsertSystem(system);
    const earlier = readEarlierState(options.dbPath);
    const fromConfigFile = (options.scenario ?? 'set') === 'set';
    if (fromConfigFile && earlier.latestConfigHash !== null && earlier.latestConfigHash !== configHash) {
      log(`note: the config differs from the one of run ${earlier.latestRunId}; jobs done by earlier runs with the same settings are kept, not redone`);
    }
    if (fromConfigFile || !earlier.hasScenario) {
      writer.setScenario({ name: config.scenario.name, team: config.scenario.team, description: config.scenario.description });
    }
    const run = {
      generatorVersion: generatorVersion(),
      gitCommit: gitCommit(),
      configHash,
      configPath,
      scenarioName: config.scenario.name,
      scenarioDescription: config.scenario.description,
      rtol: config.tolerance.rtol,
      atol: config.tolerance.atol,
      shard: formatShard(shard),
    };
    const resumed = resumableRun(earlier.latest, run);
    if (resumed) log(`run ${resumed.id} was stopped; going on under it`);
    const runId = resumed ? resumed.id : writer.startRun({ ...run, startedAt: new Date().toISOString() });
    const pending = orderJobsByCost(jobs.filter((job) => !writer.jobDone(job.key)));
    const summary: GenerateSummary = {
      runId,
      jobsInShard: jobs.length,
      jobsSkipped: jobs.length - pending.length,
      jobsDone: 0,
      jobsFailed: [],
      familiesWritten: 0,
      membersWritten: 0,
      interrupted: false,
      seconds: 0,
      workers: 0,
      jobSeconds: {},
    };
    log(
      `run ${runId}: ${jobs.length} job(s) in shard ${formatShard(shard)}` +
        (summary.jobsSkipped > 0 ? `, ${summary.jobsSkipped} already done (skipped)` : '') +
        `, ${pending.length} to run`,
    );
    if (pending.length > 0) await runJobs(pending, writer, runId, options, log, summary);
    if (!summary.interrupted) await linkChanges(writer, runId, jobs, options, log, summary);
    // An interrupted run keeps finishedAt null (catalog-db/types.ts: null after an interruption).
    if (!summary.interrupted) writer.finishRun(runId, new Date().toISOString());
    summary.seconds = (Date.now() - startMs) / 1000;
    return summary;
  } finally {
    writer.close();
  }
}

async function runJobs(
  pending: FamilyJob[],
  writer: CatalogWriter,
  runId: number,
  options: GenerateOptions,
  log: (line: string) => void,
  summary: GenerateSummary,
): Promise<void> {
  // Discovery grids run in parallel too: there may be more of them than jobs.
  const parallelWork = Math.max(pending.length, sharedDiscoveryGrids(pending).size);
  const threads = Math.max(1, Math.min(options.workers ?? defaultWorkerCount(), parallelWork));
  summary.workers = threads;
  const display = chooseDisplay(options.progress ?? 'auto', log);
  display.begin(pending.length);
  const pool = createFamilyPool(threads);
  const removeHandler =
    options.handleSigint === false
      ? () => {}
      : handleInterrupts(() => {
          summary.interrupted = true;
          pool.requestStop();
        }, display.log);
  try {
    const discovery = startSharedDiscovery(pending, pool, display.log);
    await Promise.all(
      pending.map(async (job) => {
        let jobStartMs = Date.now(); // reset when the job leaves the queue (its first progress message)
        let started = false;
        const jobWriter = createJobWriter(writer, runId, job);
        try {
          const discovered = await discovery.resultsFor(job);
          const result = discovered === null
            ? { bundles: [], interrupted: true } // a stop request ended the grids this job needs
            : await pool.run(job, {
              onProgress: (progress) => {
                if (!started) {
                  started = true;
                  jobStartMs = Date.now();
                }
                display.progress(job, progress);
              },
              onFamily: (bundle) => jobWriter.family(bundle),
            }, { discovered, stored: storedFamilies(options.dbPath, job.key) });
          if (result.interrupted) summary.interrupted = true;
          for (const note of result.notes ?? []) display.log(`note: ${note}`);
          const written = jobWriter.finish(result);
          summary.familiesWritten += written.families;
          summary.membersWritten += written.members;
          if (written.done) summary.jobsDone += 1;
          summary.jobSeconds[job.key] = (Date.now() - jobStartMs) / 1000;
          const seconds = summary.jobSeconds[job.key]!.toFixed(1);
          const what = written.families === 0 ? 'no new family' : `${written.families} famil${written.families === 1 ? 'y' : 'ies'}, ${written.members} members`;
          display.jobEnded(job, `${written.done ? 'done' : 'interrupted'} ${job.key}: ${what} (${seconds} s)`);
        } catch (error) {
          const message = error instanceof Error ? error.message : String(error);
          summary.jobsFailed.push({ key: job.key, message });
          display.jobEnded(job, `failed ${job.key}: ${message.split('\n')[0]}`);
        }
      }),
    );
  } finally {
    removeHandler();
    display.end();
    await pool.destroy();
  }
}

/** Links each signature change to the family it continues into, following hand-offs (link-signature-changes.ts). */
async function linkChanges(writer: CatalogWriter, runId: number, jobs: FamilyJob[], options: GenerateOptions, log: (line: string) => void, summary: GenerateSummary): Promise<void> {
  let stop = false;
  let pool: FamilyPool | null = null;
  const removeHandler = options.handleSigint === false ? () => {} : handleInterrupts(() => {
    stop = true;
    pool?.requestStop();
  }, log);
  try {
    const linked = await linkSignatureChanges({
      dbPath: options.dbPath, writer, runId, jobs, log, shouldStop: () => stop, pool: () => (pool ??= createFamilyPool(1)),
    });
    summary.familiesWritten += linked.familiesWritten;
    summary.membersWritten += linked.membersWritten;
    if (linked.interrupted) summary.interrupted = true;
    if (linked.linked + linked.followed + linked.unlinked > 0) {
      log(`signature changes: ${linked.linked} linked, ${linked.followed} followed as new families (${linked.familiesWritten} written), ${linked.unlinked} without a catalogued family`);
    }
  } finally {
    removeHandler();
    await (pool as FamilyPool | null)?.destroy();
  }
}

/** The job's families an earlier, stopped run already wrote (the job goes on after them). */
function storedFamilies(dbPath: string, jobKey: string) {
  const reader = openCatalogForRead(dbPath);
  try {
    return storedFamiliesOfJob(reader, jobKey);
  } finally {
    reader.close();
  }
}

function chooseDisplay(mode: 'auto' | 'bars' | 'lines', log: (line: string) => void): ProgressDisplay {
  const bars = mode === 'bars' || (mode === 'auto' && process.stderr.isTTY === true);
  return bars ? createProgressBars() : createProgressLines(log);
}

/** What the catalog already holds (the writer has created the file by now). */
function readEarlierState(dbPath: string): { hasScenario: boolean; latestRunId: number | null; latestConfigHash: string | null; latest: RunRow | null } {
  const reader = openCatalogForRead(dbPath);
  try {
    const latest = reader.runs()[0];
    return { hasScenario: reader.scenario() !== null, latestRunId: latest?.id ?? null, latestConfigHash: latest?.configHash ?? null, latest: latest ?? null };
  } finally {
    reader.close();
  }
}

/**
 * A stopped run that this one simply continues (same config text, shard, generator version and commit):
 * resuming goes on under its row instead of leaving it unfinished beside a new one.
 */
function resumableRun(latest: RunRow | null, run: Omit<RunRow, 'id' | 'finishedAt' | 'startedAt'>): RunRow | null {
  if (!latest || latest.finishedAt !== null) return null;
  const same = latest.configHash === run.configHash && latest.shard === run.shard
    && latest.generatorVersion === run.generatorVersion && latest.gitCommit === run.gitCommit;
  return same ? latest : null;
}
