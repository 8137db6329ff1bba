// The x axis shared by three family charts: minimum altitude above the smaller body, in km, with the scale
// chosen from the data. A family that starts at a collision has members down to metres above the surface;
// on a log axis from there, most of the width would show sub-kilometre approaches and squeeze the stable
// windows into slivers. So the axis starts at a floor (at least 1 km, and at most two decades below the
// lowest stable window) and the closer approaches are folded in: drawn at the left edge (clamped), their
// true altitude in the tooltip. Log where the drawn span exceeds a factor 20, linear otherwise; ticks in
// plain km (no SI prefixes).
import type { FamilyChartInput } from './chart-input.ts';
import { positiveAxisScale } from './chart-style.ts';
import type { Channel } from './family-chart-layers.ts';

export const ALTITUDE_FLOOR_KM = 1;
const DECADES_BELOW_WINDOWS = 2;

/** The lowest altitude the axis draws; members below it sit at the axis' left edge. */
export function altitudeFloorKm(input: FamilyChartInput): number {
  const lowest = Math.min(...input.members.map((m) => m.altKm).filter(Number.isFinite));
  const windowLows = input.windows.map((w) => Math.min(w.fromAltKm, w.toAltKm)).filter((v) => v > 0);
  const belowWindows = windowLows.length > 0 ? Math.min(...windowLows) / 10 ** DECADES_BELOW_WINDOWS : 0;
  return Math.max(lowest, ALTITUDE_FLOOR_KM, belowWindows);
}

export function altitudeChannel(input: FamilyChartInput): Channel {
  const values = [...input.members.map((m) => m.altKm), ...input.windows.flatMap((w) => [w.fromAltKm, w.toAltKm])].filter(Number.isFinite);
  const floor = altitudeFloorKm(input);
  const highest = Math.max(...values);
  const drawn = values.map((v) => Math.max(v, floor));
  const folded = values.some((v) => v < floor);
  const kind = positiveAxisScale(drawn);
  const scale = kind.type === 'log'
    ? { type: 'log', domain: [floor, highest], clamp: true, nice: false }
    : { type: 'linear', zero: false, ...(folded ? { domain: [floor, highest], clamp: true } : {}) };
  return {
    field: 'altKm',
    title: `minimum altitude above ${input.secondaryName} (km)${folded ? `; below ${floor.toLocaleString('en-US', { maximumFractionDigits: 1 })} km at the left edge` : ''}`,
    scale,
    axis: { format: ',~r', labelFlush: true, labelOverlap: 'greedy' },
  };
}
