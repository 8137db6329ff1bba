// Epochs as text, both ways, exact to the microsecond: epochs are integer microseconds since
// 1970-01-01T00:00:00 UTC (a Date would drop the microseconds). Written as "YYYY-MM-DDThh:mm:ss.ffffff"
// without a zone letter (the CCSDS ODM time format; the time system is stated beside it).

// Read: the date alone, or with hh:mm, seconds and up to 6 decimals optional (a browser's date-time field
// drops ":00"); a trailing Z or +00:00 (UTC) allowed.
const EPOCH_PATTERN = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.(\d{1,6}))?)?)?(Z|[+-]00:?00)?$/;
const HINT = 'ISO 8601 in UTC, e.g. 2030-01-01T00:00:00Z';
/** Cycler seeds outside this span are surely typos (the lunar theory is meant for a wider one). */
const EPOCH_YEARS = { min: 1900, max: 2100 } as const;

/** Microseconds since 1970 of an epoch written in UTC; a RangeError says what is wrong, quoting the text. */
export function parseEpochMicros(text: string): number {
  const trimmed = text.trim();
  const match = EPOCH_PATTERN.exec(trimmed);
  if (!match) {
    const zone = /[+-]\d{2}:?\d{2}$/.test(trimmed) ? '; only UTC (Z) is accepted' : '';
    throw new RangeError(`"${text}" is not allowed (${HINT}${zone})`);
  }
  const [year, month, day, hour, minute, second] = match.slice(1, 7).map((part) => Number(part ?? 0)) as number[];
  const wholeMs = Date.UTC(year!, month! - 1, day!, hour, minute, second);
  const check = new Date(wholeMs);
  const kept = check.getUTCFullYear() === year && check.getUTCMonth() === month! - 1 && check.getUTCDate() === day
    && check.getUTCHours() === hour && check.getUTCMinutes() === minute && check.getUTCSeconds() === second;
  if (!kept) throw new RangeError(`"${text}" is not a calendar date and time (${HINT})`);
  if (year! < EPOCH_YEARS.min || year! > EPOCH_YEARS.max) {
    throw new RangeError(`"${text}" is outside the allowed years ${EPOCH_YEARS.min} to ${EPOCH_YEARS.max} (${HINT})`);
  }
  return wholeMs * 1000 + Number((match[7] ?? '').padEnd(6, '0'));
}

export function formatEpochMicros(epochMicros: number): string {
  const micros = ((epochMicros % 1e6) + 1e6) % 1e6;
  const date = new Date((epochMicros - micros) / 1000);
  const pad = (v: number, n = 2) => String(v).padStart(n, '0');
  return `${pad(date.getUTCFullYear(), 4)}-${pad(date.getUTCMonth() + 1)}-${pad(date.getUTCDate())}T`
    + `${pad(date.getUTCHours())}:${pad(date.getUTCMinutes())}:${pad(date.getUTCSeconds())}.${pad(micros, 6)}`;
}
