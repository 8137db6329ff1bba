// Our chart look: sizes, fills, fonts, axis helpers and the member tooltip. The member classes (blue
// circles / orange triangles, told apart by colour AND shape for the common colour-vision deficiencies;
// bifurcations in near-black diamonds and squares) and what they mean per chart: chart-classes.ts.
import { formatStabilityIndex } from '../format/format-stability-index.ts';
import type { ChartClasses } from './chart-classes.ts';
import { niceTicks } from './nice-ticks.ts';
import type { ChartMember } from './chart-input.ts';

export const CHART_WIDTH = 520;
export const CHART_HEIGHT = 280;

export const BAND_FILL = '#dde8d3'; // |ν| < 1
export const WINDOW_FILL = '#a9c8ea'; // stable windows
export const FAMILY_LINE = '#8d949c';

export const chartConfig = {
  // No per-point ARIA labels (they tripled the SVG); each chart carries its own text alternative instead.
  aria: false,
  font: "system-ui, 'DejaVu Sans', 'Liberation Sans', Arial, sans-serif",
  background: '#ffffff',
  view: { stroke: '#c9c5bb' },
  axis: { labelColor: '#3c4652', titleColor: '#1b2129', gridColor: '#ecebe6', domainColor: '#8d949c', tickColor: '#8d949c', titleFontWeight: 600 },
  legend: { labelColor: '#3c4652', labelFontSize: 11 },
} as const;

/** Log scale for a positive quantity spanning more than a factor 20, linear otherwise. */
export function positiveAxisScale(values: number[]): { type: 'log' } | { type: 'linear'; zero: false } {
  const finite = values.filter(Number.isFinite);
  const lo = Math.min(...finite);
  const hi = Math.max(...finite);
  return lo > 0 && hi / lo > 20 ? { type: 'log' } : { type: 'linear', zero: false };
}

/**
 * Tick values for a symlog axis (constant 1): 0, ±1 and the powers of ten inside the data's range,
 * thinned to every second or third decade when the range is wide, so ν from 1e-1 to 1e8 reads cleanly;
 * where the data go past the last tick on a side (ν down to −2.7, say), one more round tick (1, 2 or 5 ×
 * 10^k) inside the data marks how far.
 */
export function symlogTicks(values: number[]): number[] {
  const finite = values.filter(Number.isFinite);
  const lo = Math.min(-1, ...finite);
  const hi = Math.max(1, ...finite);
  const maxDecade = Math.ceil(Math.log10(Math.max(Math.abs(lo), Math.abs(hi))));
  const stride = maxDecade > 12 ? 3 : maxDecade > 6 ? 2 : 1;
  const ticks = [0];
  for (let k = 0; k <= maxDecade; k++) {
    // ±1 always (edges of the stable band); further decades on the stride
    if (k > 1 && k % stride !== 0) continue;
    const p = 10 ** k;
    if (p <= hi * 1.0001) ticks.push(p);
    if (-p >= lo * 1.0001) ticks.push(-p);
  }
  const top = Math.max(...ticks);
  const bottom = Math.min(...ticks);
  const upper = roundTickBelow(hi);
  if (upper > top * 1.5) ticks.push(upper);
  const lower = -roundTickBelow(-lo);
  if (lower < bottom * 1.5) ticks.push(lower);
  return ticks.sort((a, b) => a - b);
}

/** The largest of 1, 2, 5 × 10^k not above v (v ≥ 1). */
function roundTickBelow(v: number): number {
  const power = 10 ** Math.floor(Math.log10(v));
  const m = v / power;
  return (m >= 5 ? 5 : m >= 2 ? 2 : 1) * power;
}

/** Position on a symlog axis of constant 1 (up to vega's scale factor). */
const symlog = (v: number) => Math.sign(v) * Math.log1p(Math.abs(v));

/**
 * A symlog index axis from the data: their extent, plus a band edge ±1 where it lies within one data span
 * of them (so ν_z from 0.99 to 1.0003 fills the height instead of sitting on top of a −1…1 axis), and its
 * ticks: those of symlogTicks inside the domain, or round linear ones where the domain holds fewer than
 * three of those.
 */
export function indexAxis(values: number[]): { domain: [number, number]; ticks: number[] } {
  const finite = values.filter(Number.isFinite);
  if (finite.length === 0) return { domain: [-1, 1], ticks: [-1, 0, 1] };
  let lo = Math.min(...finite);
  let hi = Math.max(...finite);
  const span = symlog(hi) - symlog(lo);
  for (const edge of [-1, 1]) {
    if (symlog(edge) >= symlog(lo) - span && symlog(edge) <= symlog(hi) + span) {
      lo = Math.min(lo, edge);
      hi = Math.max(hi, edge);
    }
  }
  if (lo === hi) [lo, hi] = [lo - 0.5, hi + 0.5];
  const inside = symlogTicks(finite).filter((t) => t >= lo && t <= hi);
  const ticks = inside.length >= 3 ? inside : [...new Set([...niceTicks(lo, hi, 4), ...[-1, 1].filter((e) => e >= lo && e <= hi)])].sort((a, b) => a - b);
  return { domain: [lo, hi], ticks };
}

/** Axis label text for symlog ticks: 1e4 style from ten thousand up. */
export const SYMLOG_LABEL_EXPR =
  "abs(datum.value) >= 10000 ? replace(format(datum.value, '.0e'), 'e+', 'e') : format(datum.value, '~g')";

/** Tooltip rows shared by every member layer. */
export function memberTooltip(secondaryName: string) {
  return [
    { field: 'seq', type: 'quantitative', title: 'member #' },
    { field: 'altKm', type: 'quantitative', title: `min. altitude above ${secondaryName} (km)`, format: ',.1f' },
    { field: 'nuText', type: 'nominal', title: 'in-plane index ν' },
    { field: 'nuVText', type: 'nominal', title: 'vertical index ν_z' },
    { field: 'jacobi', type: 'quantitative', title: 'Jacobi constant C', format: '.8~f' },
    { field: 'periodDays', type: 'quantitative', title: 'period (days)', format: '.4f' },
  ];
}

/** Member rows with the class the colour and shape read, and the indices as the pages write them. */
export function memberValues(members: ChartMember[], classes: ChartClasses) {
  return members.map((m) => ({
    ...m, cls: classes.stableOf(m) ? classes.stable : classes.unstable, nuText: formatStabilityIndex(m.nu), nuVText: formatStabilityIndex(m.nuV),
  }));
}
