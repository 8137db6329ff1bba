// `--shard auto`: the shard of a job-array task from the scheduler's variables.
// SLURM sets SLURM_ARRAY_TASK_ID, _MIN, _MAX, _STEP and _COUNT for each task of `sbatch --array`
// (SLURM sbatch manual, "OUTPUT ENVIRONMENT VARIABLES"; from memory); Kubernetes Indexed Jobs set
// JOB_COMPLETION_INDEX from 0 to completions − 1 (Kubernetes Job documentation, "Indexed completion
// mode"; from memory).
import { describe, expect, it } from 'vitest';
import { UsageError } from '../../generator/errors/usage-error.ts';
import { shardFromEnvironment, shardFromOptions } from '../../generator/run/shard-from-environment.ts';
import { selectShard } from '../../generator/run/shard.ts';

const slurm = (id: number, min: number, count: number, step?: number) => ({
  SLURM_ARRAY_TASK_ID: String(id),
  SLURM_ARRAY_TASK_MIN: String(min),
  SLURM_ARRAY_TASK_COUNT: String(count),
  ...(step === undefined ? {} : { SLURM_ARRAY_TASK_STEP: String(step) }),
});

describe('shardFromEnvironment: SLURM job arrays', () => {
  it('maps --array=1-4 task 3 to shard 3/4 and --array=0-3 task 0 to 1/4', () => {
    expect(shardFromEnvironment(slurm(3, 1, 4))).toEqual({ k: 3, n: 4 });
    expect(shardFromEnvironment(slurm(0, 0, 4))).toEqual({ k: 1, n: 4 });
  });

  it('counts from SLURM_ARRAY_TASK_MIN (--array=5-8) and in steps (--array=10-16:3)', () => {
    expect([5, 6, 7, 8].map((id) => shardFromEnvironment(slurm(id, 5, 4)))).toEqual(
      [1, 2, 3, 4].map((k) => ({ k, n: 4 })),
    );
    expect([10, 13, 16].map((id) => shardFromEnvironment(slurm(id, 10, 3, 3)).k)).toEqual([1, 2, 3]);
  });

  it('gives every job to exactly one task of an array (common practice for static sharding)', () => {
    const jobs = Array.from({ length: 17 }, (_, i) => `job${i}`);
    const parts = [5, 6, 7, 8].map((id) => selectShard(jobs, shardFromEnvironment(slurm(id, 5, 4))));
    expect(parts.flat().sort()).toEqual([...jobs].sort());
  });

  it('lets --shard-count replace SLURM_ARRAY_TASK_COUNT', () => {
    expect(shardFromEnvironment(slurm(2, 1, 4), 6)).toEqual({ k: 2, n: 6 });
  });

  it.each([
    [slurm(9, 5, 4), 'SLURM_ARRAY_TASK_ID: "9" is not allowed (an integer from 5 to 8: SLURM_ARRAY_TASK_MIN to MIN + 3)'],
    [slurm(4, 5, 4), 'SLURM_ARRAY_TASK_ID: "4" is not allowed (an integer from 5 to 8'],
    [slurm(11, 10, 3, 3), 'SLURM_ARRAY_TASK_ID: "11" is not allowed (one of 10, 13, ..., 16: SLURM_ARRAY_TASK_MIN in steps of 3, 3 tasks)'],
    [{ ...slurm(1, 1, 4), SLURM_ARRAY_TASK_ID: 'x' }, 'SLURM_ARRAY_TASK_ID: "x" is not allowed'],
    [slurm(1, 1, 0), 'SLURM_ARRAY_TASK_COUNT: "0" is not allowed (an integer from 1 to 1000)'],
    [slurm(1, 1, 1001), 'SLURM_ARRAY_TASK_COUNT: "1001" is not allowed (an integer from 1 to 1000)'],
    [{ SLURM_ARRAY_TASK_ID: '1', SLURM_ARRAY_TASK_COUNT: '2' }, 'SLURM_ARRAY_TASK_MIN is not set (needed for --shard auto; allowed: an integer ≥ 0)'],
    [{ SLURM_ARRAY_TASK_ID: '1', SLURM_ARRAY_TASK_MIN: '1' }, 'SLURM_ARRAY_TASK_COUNT is not set'],
  ])('rejects a bad or missing variable in one line naming it, its value and the range (%j)', (env, message) => {
    expect(() => shardFromEnvironment(env)).toThrow(message);
  });
});

describe('shardFromEnvironment: Kubernetes Indexed Jobs', () => {
  it('maps the 0-based JOB_COMPLETION_INDEX to shard index + 1 of --shard-count', () => {
    expect(shardFromEnvironment({ JOB_COMPLETION_INDEX: '0' }, 3)).toEqual({ k: 1, n: 3 });
    expect(shardFromEnvironment({ JOB_COMPLETION_INDEX: '2' }, 3)).toEqual({ k: 3, n: 3 });
  });

  it('needs --shard-count and an index below it', () => {
    expect(() => shardFromEnvironment({ JOB_COMPLETION_INDEX: '1' })).toThrow('--shard-count: needed with JOB_COMPLETION_INDEX="1"');
    expect(() => shardFromEnvironment({ JOB_COMPLETION_INDEX: '3' }, 3)).toThrow(
      'JOB_COMPLETION_INDEX: "3" is not allowed (an integer from 0 to 2: --shard-count 3 minus 1)',
    );
    expect(() => shardFromEnvironment({ JOB_COMPLETION_INDEX: '-1' }, 3)).toThrow('JOB_COMPLETION_INDEX: "-1" is not allowed');
  });

  it('says which variables it looked for when neither scheduler set any', () => {
    expect(() => shardFromEnvironment({})).toThrow('neither SLURM_ARRAY_TASK_ID (SLURM job array) nor JOB_COMPLETION_INDEX');
  });
});

describe('shardFromOptions: --shard and --shard-count', () => {
  it('reads k/n as before and auto from the environment', () => {
    expect(shardFromOptions('2/3', undefined, {})).toEqual({ k: 2, n: 3 });
    expect(shardFromOptions(undefined, undefined, slurm(2, 1, 2))).toBeUndefined();
    expect(shardFromOptions('auto', '4', { JOB_COMPLETION_INDEX: '1' })).toEqual({ k: 2, n: 4 });
  });

  it('turns every bad value into a usage error (exit 2)', () => {
    expect(() => shardFromOptions('2/3', '3', {})).toThrow(UsageError);
    expect(() => shardFromOptions('2/3', '3', {})).toThrow('--shard-count: only allowed with --shard auto');
    expect(() => shardFromOptions('auto', '0', { JOB_COMPLETION_INDEX: '0' })).toThrow('--shard-count: "0" is not allowed (an integer from 1 to 1000)');
    expect(() => shardFromOptions('auto', undefined, {})).toThrow(UsageError);
    expect(() => shardFromOptions('1/0', undefined, {})).toThrow(UsageError);
  });
});
