// The section plot as plain SVG geometry, computed at build time (no vega in Node for each orbit page):
// same data window, ticks and marks as the Vega-Lite spec in site/charts/section-plot-spec.ts.
import { niceTicks, tickDecimals, tickLabel } from '../charts/nice-ticks.ts';
import { sectionPlotDomain, type SectionPlotInput } from '../charts/section-plot-input.ts';
import { SECTION_PLOT_HEIGHT, SECTION_PLOT_WIDTH } from '../charts/section-plot-spec.ts';
import { roundTenth } from './svg-path.ts';

export interface AxisTick {
  at: number; // px along the axis
  label: string;
}

export interface SectionPlotFigure {
  width: number;
  height: number;
  /** Plot area in px. */
  area: { x: number; y: number; width: number; height: number };
  /** Every stored point as a zero-length segment, drawn with round caps (one path instead of 400 circles). */
  pointsD: string;
  pointCount: number;
  fixed: [number, number];
  /** Hold-radius segment from the fixed point along +x (null when the radius is 0). */
  radius: { x1: number; x2: number; y: number } | null;
  xTicks: AxisTick[];
  yTicks: AxisTick[];
}

// The right margin holds half of a centred label such as "−305,000" at the last tick.
const MARGIN = { left: 72, right: 34, top: 10, bottom: 44 };

export function sectionPlotFigure(input: SectionPlotInput): SectionPlotFigure {
  const domain = sectionPlotDomain(input);
  const area = { x: MARGIN.left, y: MARGIN.top, width: SECTION_PLOT_WIDTH, height: SECTION_PLOT_HEIGHT };
  const sx = (v: number) => area.x + ((v - domain.x[0]) / (domain.x[1] - domain.x[0])) * area.width;
  const sy = (v: number) => area.y + area.height - ((v - domain.y[0]) / (domain.y[1] - domain.y[0])) * area.height;
  let pointsD = '';
  for (const p of input.points) pointsD += `M${roundTenth(sx(p.xKm))} ${roundTenth(sy(p.vxMS))}h0`;
  const xValues = niceTicks(domain.x[0], domain.x[1], 4);
  const yValues = niceTicks(domain.y[0], domain.y[1], 5);
  const xDecimals = tickDecimals(xValues);
  const yDecimals = tickDecimals(yValues);
  const f = input.fixedPoint;
  return {
    width: MARGIN.left + area.width + MARGIN.right,
    height: MARGIN.top + area.height + MARGIN.bottom,
    area,
    pointsD,
    pointCount: input.points.length,
    fixed: [roundTenth(sx(f.xKm)), roundTenth(sy(f.vxMS))],
    radius: input.holdRadiusKm > 0
      ? { x1: roundTenth(sx(f.xKm)), x2: roundTenth(sx(f.xKm + input.holdRadiusKm)), y: roundTenth(sy(f.vxMS)) }
      : null,
    xTicks: xValues.map((v) => ({ at: roundTenth(sx(v)), label: tickLabel(v, xDecimals) })),
    yTicks: yValues.map((v) => ({ at: roundTenth(sy(v)), label: tickLabel(v, yDecimals) })),
  };
}
