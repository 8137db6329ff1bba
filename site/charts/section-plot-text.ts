// Text alternative of the section plot: what a reader without the picture needs.
import { groupedNumber } from './nice-ticks.ts';
import type { SectionPlotInput } from './section-plot-input.ts';

const km = (v: number) => `${groupedNumber(v, 1).replace(/\.0$/, '')} km`;
const ms = (v: number) => `${Number(v.toPrecision(4))} m/s`;

export function sectionPlotText(input: SectionPlotInput): string {
  const { fixedPoint: f, points } = input;
  const head = `Return-map section of ${input.memberLabel}, x against ẋ. Fixed point (the orbit itself) at x = ${km(f.xKm)}, ẋ = ${ms(f.vxMS)}.`;
  const radius = ` Hold radius ${km(input.holdRadiusKm)} along +x.`;
  if (points.length === 0) return `${head}${radius} No curve points are stored.`;
  const xs = points.map((p) => p.xKm);
  const vs = points.map((p) => p.vxMS);
  return `${head}${radius} ${points.length} stored points of the outermost curve that held for ${input.returns} returns, ` +
    `spanning x ${km(Math.min(...xs))} to ${km(Math.max(...xs))} and ẋ ${ms(Math.min(...vs))} to ${ms(Math.max(...vs))}.`;
}
