// Comma-separated numbers on the command line (e.g. --jacobi 3.05,3.1), each read by the one CLI number
// rule (parse-number.ts: decimals and exponent form; hex, blanks, NaN and Infinity refused).
import { UsageError } from '../errors/usage-error.ts';
import { readNumber } from './parse-number.ts';

export function parseNumberListOption(option: string, text: string): number[] {
  const values = text.split(',').map(readNumber);
  if (values.some((v) => v === null)) {
    throw new UsageError(`${option}: "${text}" is not allowed (comma-separated numbers, e.g. 3.05,3.1)`);
  }
  return values as number[];
}
