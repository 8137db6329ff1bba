// What a family chart's colours and shapes mean, per chart: the members are split by the index that chart
// is about (in-plane ν, or vertical ν_z on the vertical-index chart), and the bifurcation points are those of
// the index or indices it shows. The vega legend and the text above each chart both read these labels, so
// the two cannot say different things.
import type { ChartBifurcation, ChartMember } from './chart-input.ts';

export type IndexPlane = 'in-plane' | 'vertical';

export interface ChartClasses {
  /** Which index splits the members. */
  plane: IndexPlane;
  stableOf: (member: ChartMember) => boolean;
  stable: string;
  unstable: string;
  tangent: string;
  doubling: string;
  /** The bifurcations this chart draws. */
  showsBifurcation: (b: ChartBifurcation) => boolean;
}

const SYMBOL: Record<IndexPlane, string> = { 'in-plane': 'ν', vertical: 'ν_z' };

/** Members split by `plane`'s index; bifurcations of that index only, or of both ('all'). */
export function chartClasses(plane: IndexPlane, bifurcations: 'same' | 'all'): ChartClasses {
  const nu = SYMBOL[plane];
  const reached = bifurcations === 'same' ? nu : 'ν or ν_z';
  const word = plane === 'in-plane' ? 'in-plane' : 'vertically';
  return {
    plane,
    stableOf: (m) => Math.abs(plane === 'in-plane' ? m.nu : m.nuV) < 1,
    stable: `${word} stable (|${nu}| < 1)`,
    unstable: `${word} unstable (|${nu}| > 1)`,
    tangent: `tangent bifurcation (${reached} = +1)`,
    doubling: `period-doubling bifurcation (${reached} = −1)`,
    showsBifurcation: (b) => bifurcations === 'all' || b.plane === plane,
  };
}

export const CLASS_COLOURS = ['#1f5fa8', '#c0661c', '#26262b', '#26262b'];
export const CLASS_COLOUR_WORDS = ['blue circles', 'orange triangles', 'dark diamonds', 'dark squares'];
const CLASS_SHAPES = ['circle', 'triangle-up', 'diamond', 'square'];

const domainOf = (c: ChartClasses) => [c.stable, c.unstable, c.tangent, c.doubling];

export function classColor(c: ChartClasses) {
  return {
    field: 'cls', type: 'nominal', title: null,
    scale: { domain: domainOf(c), range: CLASS_COLOURS },
    legend: { orient: 'bottom', direction: 'horizontal', columns: 2, labelLimit: 320, symbolStrokeWidth: 1.5 },
  } as const;
}

export function classShape(c: ChartClasses) {
  return { field: 'cls', type: 'nominal', title: null, scale: { domain: domainOf(c), range: CLASS_SHAPES } } as const;
}

/** The sentence above a chart saying what each colour means (only what the chart draws). */
export function classLegendText(c: ChartClasses, drawn: { band: boolean; windows: boolean; bifurcations: boolean }): string {
  const parts = [
    `${CLASS_COLOUR_WORDS[0]}: ${c.stable}`,
    `${CLASS_COLOUR_WORDS[1]}: ${c.unstable}`,
  ];
  if (drawn.band) parts.push(`green band: |${SYMBOL[c.plane]}| < 1`);
  if (drawn.windows) parts.push('blue columns: stable windows (in-plane, |ν| < 1)');
  if (drawn.bifurcations) parts.push(`${CLASS_COLOUR_WORDS[2]}: ${c.tangent}`, `${CLASS_COLOUR_WORDS[3]}: ${c.doubling}`);
  return `${parts.join('; ')}.`;
}
