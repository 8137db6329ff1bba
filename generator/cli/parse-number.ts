// Strict numbers for command-line values: plain decimals and exponent form ("1e-12", "-0.5", ".3").
// Hex, blanks, "NaN" and "Infinity" are refused: Number() would accept some of them silently.
import { formatRange } from '../config/format-value.ts';
import { UsageError } from '../errors/usage-error.ts';

const NUMBER_PATTERN = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** The number written in text, or null when text is not a finite number in decimal notation. */
export function readNumber(text: string): number | null {
  const trimmed = text.trim();
  if (!NUMBER_PATTERN.test(trimmed)) return null;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : null;
}

export interface NumberRange {
  min: number;
  max: number;
  minOpen?: boolean;
  maxOpen?: boolean;
}

export function isInRange(value: number, range: NumberRange): boolean {
  const aboveMin = range.minOpen ? value > range.min : value >= range.min;
  const belowMax = range.maxOpen ? value < range.max : value <= range.max;
  return aboveMin && belowMax;
}

export function describeRange(range: NumberRange): string {
  return `a number in ${formatRange(range.min, range.max, range.minOpen ?? false, range.maxOpen ?? false)}`;
}

/** Parses option's value as a number in range, or throws a one-line UsageError naming the option. */
export function parseNumberInRange(option: string, text: string, range: NumberRange): number {
  const value = readNumber(text);
  if (value === null || !isInRange(value, range)) {
    throw new UsageError(`${option}: "${text}" is not allowed (${describeRange(range)})`);
  }
  return value;
}
