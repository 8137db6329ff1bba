// Integer and shard values of the command line, also read from the environment (shard-from-environment.ts),
// hence in the run layer. Each failure is one line naming the option and what it allows (exit code 2).
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
