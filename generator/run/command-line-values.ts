// Parsers for the generator's command-line values. Each failure is one line naming the option and
// what it allows; commands exit with USAGE_EXIT_CODE on them.
import { UsageError } from '../errors/usage-error.ts';
import { parseShard, type Shard } from './shard.ts';

export function parseIntegerOption(option: string, text: string, min: number, max: number): number {
  const value = Number(text);
  if (!/^\s*\d+\s*$/.test(text) || !(value >= min && value <= max)) {
    throw new UsageError(`${option}: "${text}" is not allowed (an integer from ${min} to ${max})`);
  }
  return value;
}

export function parseShardOption(option: string, text: string): Shard {
  try {
    return parseShard(text);
  } catch (error) {
    throw new UsageError(`${option}: ${(error as Error).message}`);
  }
}

/** Comma-separated numbers, e.g. "3.05,3.1". */
export function parseNumberListOption(option: string, text: string): number[] {
  const parts = text.split(',').map((part) => part.trim());
  const values = parts.map(Number);
  if (parts.some((part) => part === '') || values.some((v) => !Number.isFinite(v))) {
    throw new UsageError(`${option}: "${text}" is not allowed (comma-separated numbers, e.g. 3.05,3.1)`);
  }
  return values;
}
