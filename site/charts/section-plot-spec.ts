// Section plot of a screened stable orbit as a Vega-Lite spec: the stored points of the outermost invariant
// curve of the return map (x against ẋ on the section), the fixed point (the orbit itself) and the hold
// radius as a segment along +x. Scales use the shared data window and ticks, so the build's plain SVG
// (site/lib/section-plot-svg.ts) and this chart show the same picture.
import { chartConfig } from './chart-style.ts';
import { niceTicks, tickDecimals } from './nice-ticks.ts';
import { sectionPlotDomain, type SectionPlotInput } from './section-plot-input.ts';

export const SECTION_PLOT_WIDTH = 380;
export const SECTION_PLOT_HEIGHT = 240;
export const SECTION_POINT_COLOR = '#1f5fa8';
export const SECTION_FIXED_COLOR = '#26262b';
export const SECTION_RADIUS_COLOR = '#c0661c';
export const SECTION_X_TITLE = 'x on the section, rotating frame (km from the barycentre)';
export const SECTION_Y_TITLE = 'ẋ on the section (m/s)';

function axisChannel(field: string, title: string, domain: [number, number]) {
  const ticks = niceTicks(domain[0], domain[1], field === 'xKm' ? 4 : 5);
  return {
    field,
    type: 'quantitative' as const,
    title,
    scale: { domain, nice: false, zero: false },
    axis: { values: ticks, format: `,.${tickDecimals(ticks)}f`, labelFlush: true },
  };
}

const round = (v: number, decimals: number) => Number(v.toFixed(decimals));

export function sectionPlotSpec(input: SectionPlotInput, description: string) {
  const domain = sectionPlotDomain(input);
  const x = axisChannel('xKm', SECTION_X_TITLE, domain.x);
  const y = axisChannel('vxMS', SECTION_Y_TITLE, domain.y);
  const fixed = input.fixedPoint;
  const layers: Record<string, unknown>[] = [];
  if (input.holdRadiusKm > 0) {
    layers.push({
      data: { values: [{ xKm: fixed.xKm, xEndKm: fixed.xKm + input.holdRadiusKm, vxMS: fixed.vxMS, holdRadiusKm: input.holdRadiusKm }] },
      mark: { type: 'rule', color: SECTION_RADIUS_COLOR, strokeWidth: 2, strokeDash: [5, 3] },
      encoding: {
        x, x2: { field: 'xEndKm' }, y,
        tooltip: [{ field: 'holdRadiusKm', type: 'quantitative', title: 'hold radius (km)', format: ',.3~f' }],
      },
    });
  }
  if (input.points.length > 0) {
    layers.push({
      // a metre and a tenth of a mm/s: finer than a pixel, and half the bytes of full precision
      data: { values: input.points.map((p, i) => ({ xKm: round(p.xKm, 3), vxMS: round(p.vxMS, 4), k: i + 1 })) },
      mark: { type: 'point', filled: true, size: 14, color: SECTION_POINT_COLOR, opacity: 0.85 },
      encoding: {
        x, y,
        tooltip: [
          { field: 'k', type: 'quantitative', title: 'stored point #' },
          { field: 'xKm', type: 'quantitative', title: 'x (km)', format: ',.3f' },
          { field: 'vxMS', type: 'quantitative', title: 'ẋ (m/s)', format: ',.4f' },
        ],
      },
    });
  }
  layers.push({
    data: { values: [{ xKm: fixed.xKm, vxMS: fixed.vxMS, label: `fixed point (${input.memberLabel})` }] },
    mark: { type: 'point', shape: 'diamond', filled: true, size: 110, color: SECTION_FIXED_COLOR, stroke: '#ffffff', strokeWidth: 1 },
    encoding: {
      x, y,
      tooltip: [
        { field: 'label', type: 'nominal', title: 'point' },
        { field: 'xKm', type: 'quantitative', title: 'x (km)', format: ',.3f' },
        { field: 'vxMS', type: 'quantitative', title: 'ẋ (m/s)', format: ',.4f' },
      ],
    },
  });
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    description,
    width: SECTION_PLOT_WIDTH,
    height: SECTION_PLOT_HEIGHT,
    config: chartConfig,
    layer: layers,
  };
}
