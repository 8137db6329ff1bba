// Hold radius (km) of the screened members against minimum altitude above the smaller body, one panel per
// stable window (each with its own altitude axis: windows are often a few hundred km wide on a family that
// spans thousands), the hold-radius axis shared so the windows compare; points linked to the members' pages.
import { CHART_HEIGHT, CHART_WIDTH, FAMILY_LINE, chartConfig } from './chart-style.ts';
import type { HoldRadiusChartInput } from './hold-radius-input.ts';
import { windowLabel, windowSpanLabel } from './window-label.ts';

export const HOLD_POINT_COLOR = '#1f5fa8';

/** Panel title: the window and its altitude span (from the window rows). */
export function panelLabel(input: HoldRadiusChartInput, window: number | null): string {
  const w = window === null ? undefined : input.family.windows[window];
  return w ? windowSpanLabel(w, window!) : windowLabel(window);
}

export function holdRadiusChart(input: HoldRadiusChartInput, description: string) {
  const panels = new Set(input.points.map((p) => p.window)).size;
  const columns = Math.min(2, panels);
  const width = columns === 1 ? CHART_WIDTH : Math.floor((CHART_WIDTH - 50) / 2);
  const values = input.points.map((p) => ({
    ...p,
    panel: panelLabel(input, p.window),
    panelOrder: p.window ?? 1e6,
    windowLabel: windowLabel(p.window),
    sun: p.sunFraction,
    ecc: p.eccFraction,
  }));
  const x = {
    field: 'altKm', type: 'quantitative' as const, title: `minimum altitude above ${input.family.secondaryName} (km)`,
    scale: { zero: false, padding: 12 }, axis: { format: ',.0f', tickCount: 4, labelFlush: true },
  };
  const y = {
    field: 'holdKm', type: 'quantitative' as const, title: 'hold radius (km)', scale: { zero: true, nice: true },
    axis: { format: ',.4~g' },
  };
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    description,
    config: chartConfig,
    data: { values },
    columns,
    facet: {
      field: 'panel', type: 'nominal', title: null,
      sort: { field: 'panelOrder', op: 'min' },
      header: { labelFontWeight: 600, labelColor: '#1b2129', labelFontSize: 11 },
    },
    spec: {
      width,
      height: columns === 1 ? CHART_HEIGHT : Math.round(CHART_HEIGHT * 0.7),
      layer: [
        {
          mark: { type: 'line', stroke: FAMILY_LINE, strokeWidth: 1.2 },
          encoding: { x, y, order: { field: 'seq', type: 'quantitative' } },
        },
        {
          mark: { type: 'point', filled: true, size: 42, color: HOLD_POINT_COLOR, opacity: 1, cursor: 'pointer' },
          encoding: {
            x,
            y,
            href: { field: 'href', type: 'nominal' },
            tooltip: [
              { field: 'seq', type: 'quantitative', title: 'member #' },
              { field: 'windowLabel', type: 'nominal', title: 'stable window' },
              { field: 'altKm', type: 'quantitative', title: 'min. altitude (km)', format: ',.1f' },
              { field: 'jacobi', type: 'quantitative', title: 'Jacobi constant C', format: '.8~f' },
              { field: 'holdKm', type: 'quantitative', title: 'hold radius (km)', format: ',.2f' },
              { field: 'sun', type: 'quantitative', title: 'Sun survival (fraction of phases)', format: '.0%' },
              { field: 'ecc', type: 'quantitative', title: 'eccentricity survival (fraction)', format: '.0%' },
            ],
          },
        },
      ],
    },
    resolve: { scale: { x: 'independent' } },
  };
}
