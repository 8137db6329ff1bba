// The sample spacing of `export-state --step`: a duration with a unit (s, min, h, d), turned into model
// time with the catalog's time unit, or a plain number in model time (nondimensional).
import { UsageError } from '../../run/command-line-values.ts';
import { readNumber } from '../parse-number.ts';

const UNIT_SECONDS: Record<string, number> = { s: 1, min: 60, h: 3600, d: 86400 };

export function parseStepNd(option: string, text: string, timeUnitS: number): number {
  const match = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(s|min|h|d)?\s*$/.exec(text);
  const value = match ? readNumber(match[1]!) : null;
  if (!match || value === null || !(value > 0)) {
    throw new UsageError(`${option}: "${text}" is not allowed (a positive duration such as 600s, 30min, 1h, 0.5d, or a nondimensional time)`);
  }
  return match[2] === undefined ? value : (value * UNIT_SECONDS[match[2]]!) / timeUnitS;
}
