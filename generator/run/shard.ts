// Splitting a job list over n machines: shard k (1-based) takes the jobs whose index mod n is k − 1.
export interface Shard {
  k: number;
  n: number;
}

export const MAX_SHARDS = 1000;

export function formatShard(shard: Shard): string {
  return `${shard.k}/${shard.n}`;
}

/** Parses "k/n"; throws a RangeError whose message names the allowed form. */
export function parseShard(text: string): Shard {
  const match = /^(\d+)\/(\d+)$/.exec(text.trim());
  const k = match ? Number(match[1]) : Number.NaN;
  const n = match ? Number(match[2]) : Number.NaN;
  if (!(k >= 1 && n >= 1 && k <= n && n <= MAX_SHARDS)) {
    throw new RangeError(`"${text}" is not a shard (allowed: k/n with integers 1 ≤ k ≤ n ≤ ${MAX_SHARDS}, e.g. 2/3)`);
  }
  return { k, n };
}

export function selectShard<T>(items: readonly T[], shard: Shard): T[] {
  return items.filter((_, index) => index % shard.n === shard.k - 1);
}
