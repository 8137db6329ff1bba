// Build-time rendering of a Vega-Lite spec to SVG with vega in Node, keeping the chart's own scales so
// markers can be placed on the finished picture later without rendering it again.
import { compile } from 'vega-lite';
import { View, parse } from 'vega';

/** The same SVG without its links (for use as an <img>, where links do nothing). */
export function withoutLinks(svg: string): string {
  return svg.replace(/<a [^>]*>|<\/a>/g, '');
}

export interface RenderedChart {
  svg: string;
  width: number;
  height: number;
  /** SVG coordinates of a data point (x, y in the chart's x and y fields' units). */
  project(x: number, y: number): [number, number];
}

function hasScale(view: View, name: string): boolean {
  try {
    view.scale(name);
    return true;
  } catch {
    return false;
  }
}

export async function renderChart(spec: Record<string, unknown>): Promise<RenderedChart> {
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  const vegaSpec = compile(spec as any).spec;
  const view = new View(parse(vegaSpec), { renderer: 'none' });
  await view.runAsync();
  // Two decimals are a hundredth of a pixel; vega writes up to 15, which doubled the file. Only inside
  // tags (coordinates): the text between them is labels, where "0.992" must not become "0.99".
  const svg = (await view.toSVG()).replace(/<[^>]+>/g, (tag) => tag.replace(/(\d\.\d\d)\d+/g, '$1'));
  view.finalize();
  const size = /<svg[^>]*\bwidth="([\d.]+)"[^>]*\bheight="([\d.]+)"/.exec(svg);
  // The plot area's origin is the first group translation (autosize padding + axis space).
  const origin = /transform="translate\(([-\d.]+),([-\d.]+)\)"/.exec(svg);
  if (!size || !origin) throw new Error('renderChart: unexpected SVG from vega (no size or origin)');
  // Single-view charts have scales named x and y; faceted ones (one scale per panel) cannot be projected.
  const x = hasScale(view, 'x') ? (view.scale('x') as (v: number) => number) : null;
  const y = hasScale(view, 'y') ? (view.scale('y') as (v: number) => number) : null;
  const ox = Number(origin[1]);
  const oy = Number(origin[2]);
  return {
    svg,
    width: Number(size[1]),
    height: Number(size[2]),
    project: (vx, vy) => {
      if (!x || !y) throw new Error('renderChart: this chart has no single x and y scale to project onto');
      return [ox + x(vx), oy + y(vy)];
    },
  };
}
