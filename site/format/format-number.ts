// Display formatting for numbers (the downloads keep full precision; these are for reading).

const DASH = '—';

/** `sig` significant digits; exponent form outside [1e-4, 1e7). */
export function formatSig(value: number | null | undefined, sig = 6): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return DASH;
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs >= 1e7 || abs < 1e-4) return value.toExponential(sig - 1).replace(/\.?0+e/, 'e');
  return Number(value.toPrecision(sig)).toString();
}

// One formatter per decimals count (toLocaleString with options builds a new one on every call, ~50 µs,
// which added up to milliseconds per page).
const fixedFormats = new Map<number, Intl.NumberFormat>();

/** Grouped with commas, `decimals` after the point (km, days). */
export function formatFixed(value: number | null | undefined, decimals = 0): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return DASH;
  let format = fixedFormats.get(decimals);
  if (!format) {
    format = new Intl.NumberFormat('en-US', { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
    fixedFormats.set(decimals, format);
  }
  return format.format(value);
}

/** A fraction (0..1) as a whole percent. */
export function formatPercent(fraction: number | null | undefined): string {
  if (fraction === null || fraction === undefined || !Number.isFinite(fraction)) return DASH;
  return `${formatFixed(fraction * 100, 0)} %`;
}

/** Shortest text that reads back to the same double (for states and anything copied into other tools). */
export function formatExact(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return DASH;
  return String(value);
}

/** A range "a – b" with the same formatter on both ends. */
export function formatRange(lo: number, hi: number, format: (v: number) => string): string {
  return lo === hi ? format(lo) : `${format(lo)} – ${format(hi)}`;
}
