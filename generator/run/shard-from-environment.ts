// `--shard auto`: the shard of this task of a batch-scheduler job array, read from the variables the
// scheduler sets. SLURM (`sbatch --array=...`): SLURM_ARRAY_TASK_ID, counted from SLURM_ARRAY_TASK_MIN in
// steps of SLURM_ARRAY_TASK_STEP, with SLURM_ARRAY_TASK_COUNT tasks. Kubernetes Indexed Jobs:
// JOB_COMPLETION_INDEX (0-based); the Job's completion count is not in the environment, so it is given
// with --shard-count. Every failure is one line naming the variable, its value and the allowed range.
import { parseIntegerOption, parseShardOption } from './command-line-values.ts';
import { UsageError } from '../errors/usage-error.ts';
import { MAX_SHARDS, type Shard } from './shard.ts';

export type ShardEnvironment = Readonly<Record<string, string | undefined>>;

/** A missing or bad scheduler variable; the CLI turns it into a usage error (exit 2). */
export class ShardEnvironmentError extends RangeError {
  override name = 'ShardEnvironmentError';
}

function integerVariable(env: ShardEnvironment, name: string, min: number, max: number, range: string): number {
  const text = env[name];
  if (text === undefined) throw new ShardEnvironmentError(`${name} is not set (needed for --shard auto; allowed: ${range})`);
  const value = Number(text);
  if (!/^\s*-?\d+\s*$/.test(text) || !(value >= min && value <= max)) {
    throw new ShardEnvironmentError(`${name}: "${text}" is not allowed (${range})`);
  }
  return value;
}

function slurmShard(env: ShardEnvironment, shardCount: number | undefined): Shard {
  const n = shardCount
    ?? integerVariable(env, 'SLURM_ARRAY_TASK_COUNT', 1, MAX_SHARDS, `an integer from 1 to ${MAX_SHARDS}`);
  // Array ids need not start at 0 or 1 (--array=5-8): count from the smallest id, in the array's step.
  const min = integerVariable(env, 'SLURM_ARRAY_TASK_MIN', 0, Number.MAX_SAFE_INTEGER, 'an integer ≥ 0');
  const step = env.SLURM_ARRAY_TASK_STEP === undefined
    ? 1
    : integerVariable(env, 'SLURM_ARRAY_TASK_STEP', 1, Number.MAX_SAFE_INTEGER, 'an integer ≥ 1');
  const max = min + (n - 1) * step;
  const allowed = step === 1
    ? `an integer from ${min} to ${max}: SLURM_ARRAY_TASK_MIN to MIN + ${n - 1}`
    : `one of ${min}, ${min + step}, ..., ${max}: SLURM_ARRAY_TASK_MIN in steps of ${step}, ${n} tasks`;
  const id = integerVariable(env, 'SLURM_ARRAY_TASK_ID', min, max, allowed);
  if ((id - min) % step !== 0) throw new ShardEnvironmentError(`SLURM_ARRAY_TASK_ID: "${env.SLURM_ARRAY_TASK_ID}" is not allowed (${allowed})`);
  return { k: (id - min) / step + 1, n };
}

function kubernetesShard(env: ShardEnvironment, shardCount: number | undefined): Shard {
  if (shardCount === undefined) {
    throw new ShardEnvironmentError(
      `--shard-count: needed with JOB_COMPLETION_INDEX="${env.JOB_COMPLETION_INDEX}" (the Job's completions, an integer from 1 to ${MAX_SHARDS})`,
    );
  }
  const index = integerVariable(env, 'JOB_COMPLETION_INDEX', 0, shardCount - 1, `an integer from 0 to ${shardCount - 1}: --shard-count ${shardCount} minus 1`);
  return { k: index + 1, n: shardCount };
}

/**
 * The shard of this array task. SLURM's variables win when both schedulers' are set; shardCount (from
 * --shard-count) replaces SLURM_ARRAY_TASK_COUNT when given.
 */
export function shardFromEnvironment(env: ShardEnvironment, shardCount?: number): Shard {
  if (env.SLURM_ARRAY_TASK_ID !== undefined) return slurmShard(env, shardCount);
  if (env.JOB_COMPLETION_INDEX !== undefined) return kubernetesShard(env, shardCount);
  throw new ShardEnvironmentError(
    '--shard auto: neither SLURM_ARRAY_TASK_ID (SLURM job array) nor JOB_COMPLETION_INDEX (Kubernetes Indexed Job) is set; give --shard k/n instead',
  );
}

/** The --shard and --shard-count options of generate: "k/n", or "auto" from the environment. */
export function shardFromOptions(shardText: string | undefined, shardCountText: string | undefined, env: ShardEnvironment): Shard | undefined {
  if (shardText?.trim() !== 'auto') {
    if (shardCountText !== undefined) throw new UsageError(`--shard-count: only allowed with --shard auto (got --shard ${shardText ?? 'unset'})`);
    return shardText === undefined ? undefined : parseShardOption('--shard', shardText);
  }
  const count = shardCountText === undefined ? undefined : parseIntegerOption('--shard-count', shardCountText, 1, MAX_SHARDS);
  try {
    return shardFromEnvironment(env, count);
  } catch (error) {
    throw error instanceof ShardEnvironmentError ? new UsageError(error.message) : error;
  }
}
