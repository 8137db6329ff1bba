// Calendar text "YYYY-MM-DDThh:mm:ss.ffffff" for a start epoch plus elapsed seconds, exact to the
// microsecond (integer arithmetic, so no millisecond rounding of JavaScript dates creeps in).

// Seconds may be left out (a browser's date-time field drops ":00"); a trailing Z (UTC) is allowed.
const EPOCH_PATTERN = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2})(?:\.(\d{1,6}))?)?Z?$/;

/** Microseconds since 1970-01-01T00:00:00 of an epoch written as above (read as UTC, or as a model time scale). */
export function parseEpochMicros(text: string): number {
  const m = EPOCH_PATTERN.exec(text.trim());
  if (!m) throw new RangeError(`start epoch must look like 2030-01-01T00:00:00.000, got ${JSON.stringify(text)}`);
  const [, y, mo, d, h, mi, s, frac] = m;
  const ms = Date.UTC(Number(y), Number(mo) - 1, Number(d), Number(h), Number(mi), Number(s ?? 0));
  if (!Number.isFinite(ms) || Number(mo) > 12 || Number(d) > 31 || Number(h) > 23 || Number(mi) > 59 || Number(s ?? 0) > 59) {
    throw new RangeError(`start epoch ${JSON.stringify(text)} is not a valid date and time`);
  }
  return ms * 1000 + Number((frac ?? '').padEnd(6, '0'));
}

/** The epoch (µs since 1970) `elapsedS` after the start, rounded to the microsecond like formatEpoch. */
export function epochMicrosAfter(startMicros: number, elapsedS: number): number {
  return startMicros + Math.round(elapsedS * 1e6);
}

export function formatEpochMicros(total: number): string {
  const micros = ((total % 1e6) + 1e6) % 1e6;
  const date = new Date((total - micros) / 1000);
  const pad = (v: number, n = 2) => String(v).padStart(n, '0');
  return `${pad(date.getUTCFullYear(), 4)}-${pad(date.getUTCMonth() + 1)}-${pad(date.getUTCDate())}T${pad(date.getUTCHours())}:${pad(date.getUTCMinutes())}:${pad(date.getUTCSeconds())}.${pad(micros, 6)}`;
}

export function formatEpoch(startMicros: number, elapsedS: number): string {
  return formatEpochMicros(epochMicrosAfter(startMicros, elapsedS));
}
