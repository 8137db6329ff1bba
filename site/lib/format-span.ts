// Ranges and widths that read right however narrow they are: a span "lo – hi" in ascending order whose ends
// get more digits until they differ, and a width that is not zero never reading as zero.
import { formatFixed, formatSig } from '../format/format-number.ts';

export type DigitStyle = 'sig' | 'fixed';

const MAX_DIGITS: Record<DigitStyle, number> = { sig: 17, fixed: 12 };

function format(value: number, style: DigitStyle, digits: number): string {
  return style === 'sig' ? formatSig(value, digits) : formatFixed(value, digits);
}

/** "lo – hi", smaller end first, with at least `digits` and as many more as the two ends need to differ. */
export function formatSpan(a: number, b: number, style: DigitStyle, digits: number): string {
  const [lo, hi] = a <= b ? [a, b] : [b, a];
  if (lo === hi || !Number.isFinite(lo) || !Number.isFinite(hi)) return `${format(lo, style, digits)} – ${format(hi, style, digits)}`;
  let d = digits;
  while (d < MAX_DIGITS[style] && format(lo, style, d) === format(hi, style, d)) d++;
  return `${format(lo, style, d)} – ${format(hi, style, d)}`;
}

/** A width (≥ 0) with at least `digits`, and more while a width above zero would read as zero. */
export function formatWidth(width: number, style: DigitStyle, digits: number): string {
  let d = digits;
  const zero = format(0, style, digits);
  while (width !== 0 && d < MAX_DIGITS[style] && format(Math.abs(width), style, d) === format(0, style, d)) d++;
  return width === 0 ? zero : format(Math.abs(width), style, d);
}
