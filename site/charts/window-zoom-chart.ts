// The in-plane index close up on each stable window: one panel per window, its altitude axis linear over
// the window and a quarter of its width either side, so a 190 km window on a family that spans 50,000 km
// fills most of a panel. Same marks and colours as the full stability chart (chart-classes.ts).
import type { ChartClasses } from './chart-classes.ts';
import type { ChartWindow, FamilyChartInput } from './chart-input.ts';
import { CHART_HEIGHT, CHART_WIDTH, SYMLOG_LABEL_EXPR, chartConfig, indexAxis } from './chart-style.ts';
import { windowSpanLabel } from './window-label.ts';
import { bandLayer, bifurcationLayer, familyLineLayer, memberLayer, windowLayer, type Channel } from './family-chart-layers.ts';

/** Each side of a window, as a fraction of its width, shown around it. */
export const ZOOM_MARGIN = 0.25;

/** The altitude span a window's panel shows (km). */
export function zoomSpanKm(w: ChartWindow): [number, number] {
  const lo = Math.min(w.fromAltKm, w.toAltKm);
  const hi = Math.max(w.fromAltKm, w.toAltKm);
  const margin = Math.max((hi - lo) * ZOOM_MARGIN, 0.5); // at least half a km for a window of zero width
  return [Math.max(0, lo - margin), hi + margin];
}

/** The Jacobi-constant span the same window's zoom shows (for charts with C along x). */
export function zoomSpanJacobi(w: ChartWindow): [number, number] {
  const lo = Math.min(w.fromJacobi, w.toJacobi);
  const hi = Math.max(w.fromJacobi, w.toJacobi);
  const margin = Math.max((hi - lo) * ZOOM_MARGIN, 1e-9);
  return [lo - margin, hi + margin];
}


export function windowZoomChart(input: FamilyChartInput, description: string, classes: ChartClasses) {
  const columns = Math.min(2, input.windows.length);
  const width = columns === 1 ? CHART_WIDTH : Math.floor((CHART_WIDTH - 60) / 2);
  const panels = input.windows.map((w, i) => {
    const [lo, hi] = zoomSpanKm(w);
    const members = input.members.filter((m) => m.altKm >= lo && m.altKm <= hi);
    const x: Channel = {
      field: 'altKm',
      title: `${windowSpanLabel(w, i)} above ${input.secondaryName}`,
      scale: { type: 'linear', domain: [lo, hi], nice: false, zero: false },
      axis: { format: ',~r', tickCount: 4, labelFlush: true, labelOverlap: 'greedy' },
    };
    const axis = indexAxis(members.map((m) => m.nu));
    const y: Channel = {
      field: 'nu',
      title: 'in-plane index ν (symlog)',
      scale: { type: 'symlog', constant: 1, domain: axis.domain, nice: false, padding: 6 },
      axis: { values: axis.ticks, labelExpr: SYMLOG_LABEL_EXPR },
    };
    const inSpan = input.bifurcations.filter((b) => b.altKm >= lo && b.altKm <= hi);
    return {
      width,
      height: Math.round(CHART_HEIGHT * 0.7),
      layer: [
        bandLayer(y),
        windowLayer([w], x, 'fromAltKm', 'toAltKm'),
        members.length > 0 ? familyLineLayer(members, x, y) : null,
        members.length > 0 ? memberLayer(members, x, y, classes, input.secondaryName) : null,
        bifurcationLayer(inSpan, 'altKm', x, y, (b) => (b.kind === 'tangent' ? 1 : -1), classes),
      ].filter((layer) => layer !== null),
      resolve: { scale: { color: 'shared', shape: 'shared' } },
    };
  });
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    description,
    config: chartConfig,
    columns,
    concat: panels,
  };
}
