import type { EventSpec } from './event-spec.ts';

/** Crossings of the plane y = 0 (the x-axis in planar runs), optionally filtered by side and direction. */
export function yAxisCrossing(options: {
  direction?: -1 | 0 | 1;
  xMin?: number;
  xMax?: number;
  terminalCount?: number;
  label?: string;
} = {}): EventSpec {
  const xMin = options.xMin ?? -Infinity;
  const xMax = options.xMax ?? Infinity;
  const filtered = Number.isFinite(xMin) || Number.isFinite(xMax);
  return {
    label: options.label ?? 'y=0',
    g: (_t, s) => s[1],
    direction: options.direction ?? 0,
    accept: filtered ? (_t, s) => s[0] > xMin && s[0] < xMax : undefined,
    terminalCount: options.terminalCount,
  };
}
