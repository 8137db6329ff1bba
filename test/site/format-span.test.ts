// Narrow stable windows on the family page (site/lib/format-span.ts); the expected texts are plain
// decimal rounding (common practice).
import { describe, expect, it } from 'vitest';
import { formatSpan, formatWidth } from '../../site/lib/format-span.ts';

describe('formatSpan and formatWidth', () => {
  it('puts the smaller end first', () => {
    expect(formatSpan(433.25, 400.04, 'fixed', 1)).toBe('400.0 – 433.3');
    expect(formatSpan(3.1, 3.0, 'sig', 10)).toBe('3 – 3.1');
  });

  it('gives a narrow span the digits its ends need to differ', () => {
    expect(formatSpan(3.030113296, 3.0301132964, 'sig', 10)).toBe('3.030113296 – 3.0301132964');
    expect(formatSpan(400.01, 400.04, 'fixed', 1)).toBe('400.01 – 400.04');
  });

  it('never shows a width above zero as zero', () => {
    expect(formatWidth(0.03, 'fixed', 1)).toBe('0.03');
    expect(formatWidth(0.0004, 'fixed', 1)).toBe('0.0004');
    expect(formatWidth(12.34, 'fixed', 1)).toBe('12.3');
    expect(formatWidth(0, 'fixed', 1)).toBe('0.0');
  });
});
