// Round tick values for a linear axis (steps of 1, 2 or 5 × 10^k, the usual choice of chart libraries),
// and the decimals a label needs to tell neighbouring ticks apart.

export function tickStep(lo: number, hi: number, count: number): number {
  const raw = Math.abs(hi - lo) / Math.max(1, count);
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const power = 10 ** Math.floor(Math.log10(raw));
  const m = raw / power;
  return (m >= 7.5 ? 10 : m >= 3.5 ? 5 : m >= 1.5 ? 2 : 1) * power;
}

/** Multiples of the step inside [lo, hi] (about `count` of them). */
export function niceTicks(lo: number, hi: number, count = 5): number[] {
  const step = tickStep(lo, hi, count);
  const ticks: number[] = [];
  const first = Math.ceil(lo / step - 1e-9);
  const last = Math.floor(hi / step + 1e-9);
  // k × step, not repeated additions, so labels come out round
  for (let k = first; k <= last && ticks.length < 50; k++) ticks.push(Number((k * step).toPrecision(12)));
  return ticks;
}

export function tickDecimals(ticks: number[]): number {
  if (ticks.length < 2) return 0;
  const step = Math.abs(ticks[1] - ticks[0]);
  return Math.max(0, Math.min(10, -Math.floor(Math.log10(step) + 1e-9)));
}

// One formatter per decimals count: toLocaleString with options builds a new one per call (~50 µs).
const formatters = new Map<number, Intl.NumberFormat>();
function grouped(decimals: number): Intl.NumberFormat {
  let f = formatters.get(decimals);
  if (!f) {
    f = new Intl.NumberFormat('en-US', { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
    formatters.set(decimals, f);
  }
  return f;
}

/** Text with thousands separators and exactly `decimals` decimals. */
export function groupedNumber(value: number, decimals: number): string {
  return grouped(decimals).format(value);
}

/** Label text with thousands separators and a real minus sign. */
export function tickLabel(value: number, decimals: number): string {
  const text = grouped(decimals).format(Math.abs(value));
  return value < 0 && Number(text.replace(/,/g, '')) !== 0 ? `−${text}` : text;
}
