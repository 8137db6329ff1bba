// Text alternative of the hold-radius chart: per stable window, how many members were screened and the
// range of their hold radii, with the largest and where it sits.
import { memberLabel } from '../../catalog-db/member-label.ts';
import { panelLabel } from './hold-radius-chart.ts';
import type { HoldRadiusChartInput, HoldRadiusPoint } from './hold-radius-input.ts';

const km = (v: number) => `${v.toLocaleString('en-US', { maximumFractionDigits: v < 10 ? 2 : 0 })} km`;

export function holdRadiusChartText(input: HoldRadiusChartInput): string {
  const groups = new Map<number | null, HoldRadiusPoint[]>();
  for (const p of input.points) {
    const list = groups.get(p.window);
    if (list) list.push(p);
    else groups.set(p.window, [p]);
  }
  const parts = [...groups.entries()]
    .sort(([a], [b]) => (a ?? Infinity) - (b ?? Infinity))
    .map(([w, list]) => {
      const best = list.reduce((a, b) => (b.holdKm > a.holdKm ? b : a));
      const lo = Math.min(...list.map((p) => p.holdKm));
      const range = lo === best.holdKm ? km(lo) : `${km(lo)} to ${km(best.holdKm)}`;
      return `${panelLabel(input, w)}, ${list.length} member${list.length === 1 ? '' : 's'}, hold radius ${range}, largest at member ${memberLabel(best.seq)} (${km(best.altKm)} above ${input.family.secondaryName})`;
    });
  return `Hold radius against minimum altitude above ${input.family.secondaryName}, one panel per stable window, ${input.points.length} member${input.points.length === 1 ? '' : 's'} with a hold radius. ${parts.join('; ')}.`;
}
