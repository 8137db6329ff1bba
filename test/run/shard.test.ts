// Shard selection: shard k of n takes the jobs whose index mod n is k − 1; the shards of a job list
// are disjoint and together give every job exactly once (common practice for static sharding).
import { describe, expect, it } from 'vitest';
import { buildJobs } from '../../generator/config/build-jobs.ts';
import { loadConfig } from '../../generator/config/load-config.ts';
import { parseShard, selectShard } from '../../generator/run/shard.ts';

describe('selectShard', () => {
  const loaded = loadConfig(new URL('../../catalogs/demo.yaml', import.meta.url).pathname);
  const keys = buildJobs(loaded.config, loaded.configPath).map((j) => j.key);

  it('takes index mod n = k − 1', () => {
    expect(selectShard(keys, { k: 2, n: 5 })).toEqual([keys[1], keys[6], keys[11]]);
    expect(selectShard(keys, { k: 1, n: 1 })).toEqual(keys);
  });

  it.each([1, 2, 3, 5, 12, 13])('splits the demo jobs into %i disjoint shards covering every job once', (n) => {
    const parts = Array.from({ length: n }, (_, i) => selectShard(keys, { k: i + 1, n }));
    expect(parts.flat().sort()).toEqual([...keys].sort());
    expect(new Set(parts.flat()).size).toBe(keys.length);
    const sizes = parts.map((p) => p.length);
    expect(Math.max(...sizes) - Math.min(...sizes)).toBeLessThanOrEqual(1);
  });
});

describe('parseShard', () => {
  it('reads k/n', () => {
    expect(parseShard('2/3')).toEqual({ k: 2, n: 3 });
    expect(parseShard('1/1')).toEqual({ k: 1, n: 1 });
  });

  it.each(['0/2', '3/2', '2', '1/0', 'a/b', '1.5/2', '1/1001', '-1/2'])('rejects %s naming the allowed form', (text) => {
    expect(() => parseShard(text)).toThrow(`"${text}" is not a shard (allowed: k/n with integers 1 ≤ k ≤ n ≤ 1000, e.g. 2/3)`);
  });
});
