// The start epoch of `export-state --epoch`: ISO 8601 in UTC, to any fraction of a second, as
// milliseconds since 1970 (a fractional number, so microseconds survive). Another time zone is refused,
// and so are dates outside 1900–2100 (the span the Moon's ephemeris is meant for is wider, but a cycler
// seed outside it is surely a typo).
import { UsageError } from '../../run/command-line-values.ts';

const EPOCH_PATTERN = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(\.\d+)?)?)?(Z|[+-]00:?00)?$/;
const HINT = 'ISO 8601 in UTC, e.g. 2030-01-01T00:00:00Z';

export function parseEpochUtc(option: string, text: string): number {
  const match = EPOCH_PATTERN.exec(text.trim());
  if (!match) {
    const zone = /(?:[+-]\d{2}:?\d{2})$/.test(text.trim()) ? '; only UTC (Z) is accepted' : '';
    throw new UsageError(`${option}: "${text}" is not allowed (${HINT}${zone})`);
  }
  const [year, month, day, hour = 0, minute = 0, second = 0] = match.slice(1, 7).map((part) => Number(part ?? 0));
  const fractionMs = match[7] ? Number(match[7]) * 1000 : 0;
  const wholeMs = Date.UTC(year!, month! - 1, day!, hour, minute, second);
  const check = new Date(wholeMs);
  const fieldsKept = check.getUTCFullYear() === year && check.getUTCMonth() === month! - 1 && check.getUTCDate() === day
    && check.getUTCHours() === hour && check.getUTCMinutes() === minute && check.getUTCSeconds() === second;
  if (!fieldsKept) throw new UsageError(`${option}: "${text}" is not a calendar date and time (${HINT})`);
  if (year! < 1900 || year! > 2100) throw new UsageError(`${option}: "${text}" is outside the allowed years 1900 to 2100 (${HINT})`);
  return wholeMs + fractionMs;
}
