// `cycler-atlas generate [CONFIG] --db FILE [--workers N] [--shard k/n]`, or one family without a
// config: `cycler-atlas generate --system earth-moon --signature E2M1 --db FILE`.
// Exit codes: 0 done, 1 some jobs failed, 2 bad arguments or config, 130 interrupted (Ctrl-C).
import { Command } from 'commander';
import { ConfigError } from '../../config/validate-config.ts';
import { formatConfigPath } from '../../config/config-path.ts';
import { loadConfig, type LoadedConfig } from '../../config/load-config.ts';
import { SINGLE_FAMILY_OPTION_OF_PATH, singleFamilyConfig } from '../../config/single-family-config.ts';
import { exitWithUsageCode, failWith } from '../command-exit.ts';
import { parseIntegerOption } from '../../run/command-line-values.ts';
import { parseNumberListOption } from '../parse-number-list.ts';
import { UsageError } from '../../errors/usage-error.ts';
import { generateFromConfig, type GenerateSummary } from '../../run/generate-catalog.ts';
import { INTERRUPTED_EXIT_CODE } from '../../run/interrupt-handler.ts';
import { lockCatalog } from '../../run/catalog-lock.ts';
import { catalogTotals } from '../../run/catalog-totals.ts';
import { assertWritableCatalogPath } from '../../run/path-options.ts';
import { RECOMPUTE_OPTION } from '../../run/settings-changes.ts';
import type { Shard } from '../../run/shard.ts';
import { shardFromOptions } from '../../run/shard-from-environment.ts';

export const DEFAULT_CONFIG_PATH = 'catalogs/demo.yaml';
export const DEFAULT_DB_PATH = 'catalog-db/demo.sqlite';
const PROGRESS_MODES = ['auto', 'bars', 'lines'] as const;

interface GenerateFlags {
  db: string;
  workers?: string;
  shard?: string;
  shardCount?: string;
  system?: string;
  signature?: string;
  lyapunov?: string;
  jacobi?: string;
  maxMembers?: string;
  progress: string;
  recomputeChanged?: boolean;
  wait?: boolean;
  force?: boolean;
}

export function createGenerateCommand(): Command {
  const command = new Command('generate')
    .description('compute the families of a catalog config (or one family) into a SQLite catalog; resumes where a run stopped')
    .argument('[config]', `catalog config (YAML; default ${DEFAULT_CONFIG_PATH})`)
    .option('--db <file>', 'catalog file to write (created if missing)', DEFAULT_DB_PATH)
    .option('--workers <n>', 'worker threads (default: one per core)')
    .option('--shard <k/n|auto>', 'run only shard k of n (jobs whose index mod n is k-1); auto: from SLURM_ARRAY_TASK_ID or JOB_COMPLETION_INDEX')
    .option('--shard-count <n>', 'with --shard auto: number of shards (needed with JOB_COMPLETION_INDEX)')
    .option('--system <id>', 'one family without a config: system preset id, e.g. earth-moon')
    .option('--signature <sig>', 'with --system: lap signature, e.g. E2M1')
    .option('--lyapunov <point>', 'with --system: L1 or L2 Lyapunov family')
    .option('--jacobi <list>', 'with --signature: Jacobi levels of the discovery grid instead of the built-in spacing, comma-separated')
    .option('--max-members <n>', 'with --system: member limit of the family')
    .option('--progress <mode>', `progress display: ${PROGRESS_MODES.join(', ')}`, 'auto')
    .option(
      RECOMPUTE_OPTION,
      "delete and recompute the families whose system constants or job settings differ from the catalog's (refused without it)",
    )
    .option('--wait', 'when another run holds the catalog, wait for it to finish (default: refuse, exit 2)')
    .option('--force', 'start even when the estimated discovery work is above the bound (refused without it, with the estimate)')
    .action(async (configArg: string | undefined, flags: GenerateFlags) => {
      try {
        const summary = await generate(configArg, flags);
        process.exitCode = summary.interrupted ? INTERRUPTED_EXIT_CODE : summary.jobsFailed.length > 0 ? 1 : 0;
      } catch (error) {
        failWith(command, error);
      }
    });
  return exitWithUsageCode(command);
}

async function generate(configArg: string | undefined, flags: GenerateFlags): Promise<GenerateSummary> {
  assertWritableCatalogPath('--db', flags.db);
  const workers = flags.workers === undefined ? undefined : parseIntegerOption('--workers', flags.workers, 1, 256);
  const shard = shardFromOptions(flags.shard, flags.shardCount, process.env);
  if (!(PROGRESS_MODES as readonly string[]).includes(flags.progress)) {
    throw new UsageError(`--progress: "${flags.progress}" is not allowed (allowed: ${PROGRESS_MODES.join(', ')})`);
  }
  const single = flags.system !== undefined;
  const loaded = single ? singleFamily(configArg, flags) : configFile(configArg, flags);
  const release = await lockCatalog('--db', flags.db, { wait: flags.wait === true, waitOption: '--wait', log: (line) => console.error(line) });
  try {
    return await generateLocked(loaded, flags, { workers, shard, single });
  } finally {
    release();
  }
}

async function generateLocked(
  loaded: LoadedConfig,
  flags: GenerateFlags,
  { workers, shard, single }: { workers?: number; shard?: Shard; single: boolean },
): Promise<GenerateSummary> {
  const summary = await generateFromConfig(loaded, {
    dbPath: flags.db,
    workers,
    shard,
    progress: flags.progress as (typeof PROGRESS_MODES)[number],
    scenario: single ? 'if-missing' : 'set',
    recomputeChanged: flags.recomputeChanged === true,
    force: flags.force === true,
  });
  const failed = summary.jobsFailed.length;
  const totals = catalogTotals(flags.db, summary.runId);
  console.log(
    `run ${summary.runId}${summary.interrupted ? ' interrupted' : ''}: ${summary.jobsDone} job(s) done, ${summary.jobsSkipped} skipped (done before)` +
      `${failed > 0 ? `, ${failed} failed` : ''}; ${totals.runFamilies} families, ${totals.runMembers} members written ` +
      `to ${flags.db} (now ${totals.families} families, ${totals.members} members) in ${summary.seconds.toFixed(1)} s with ${summary.workers} worker(s)`,
  );
  if (summary.interrupted) console.log('interrupted: run the same command again to resume');
  return summary;
}

function configFile(configArg: string | undefined, flags: GenerateFlags): LoadedConfig {
  for (const option of ['signature', 'lyapunov', 'jacobi', 'maxMembers'] as const) {
    if (flags[option] !== undefined) {
      throw new UsageError(`--${option === 'maxMembers' ? 'max-members' : option}: only allowed with --system (one family without a config)`);
    }
  }
  return loadConfig(configArg ?? DEFAULT_CONFIG_PATH);
}

function singleFamily(configArg: string | undefined, flags: GenerateFlags): LoadedConfig {
  if (configArg !== undefined) throw new UsageError(`--system: not allowed together with a config file ("${configArg}"); give one or the other`);
  if ((flags.signature === undefined) === (flags.lyapunov === undefined)) {
    throw new UsageError('--system: needs exactly one of --signature (e.g. E2M1) or --lyapunov (L1 or L2)');
  }
  if (flags.jacobi !== undefined && flags.signature === undefined) throw new UsageError('--jacobi: only allowed with --signature');
  try {
    return singleFamilyConfig({
      system: flags.system as string,
      signature: flags.signature,
      lyapunov: flags.lyapunov,
      jacobi: flags.jacobi === undefined ? undefined : parseNumberListOption('--jacobi', flags.jacobi),
      maxMembers: flags.maxMembers === undefined ? undefined : parseIntegerOption('--max-members', flags.maxMembers, 1, 100_000),
    });
  } catch (error) {
    // Name the option rather than the generated config's field.
    if (error instanceof ConfigError && error.issue) {
      const path = formatConfigPath(error.issue.path);
      const option = SINGLE_FAMILY_OPTION_OF_PATH.find(([pattern]) => pattern.test(path))?.[1];
      if (option) throw new UsageError(`${option}: ${error.issue.message}`);
    }
    throw error;
  }
}
