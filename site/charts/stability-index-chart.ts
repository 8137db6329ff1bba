// In-plane stability index ν against minimum altitude above the smaller body, symlog y (ν spans 1e-1 to 1e8),
// with the |ν| < 1 band, the stable windows and the bifurcations (tangent at ν = +1, period doubling at −1).
import { altitudeChannel } from './altitude-channel.ts';
import type { FamilyChartInput } from './chart-input.ts';
import { CHART_HEIGHT, CHART_WIDTH, SYMLOG_LABEL_EXPR, chartConfig, symlogTicks } from './chart-style.ts';
import { bandLayer, bifurcationLayer, familyLineLayer, memberLayer, windowLayer, type Channel } from './family-chart-layers.ts';

export function stabilityIndexChart(input: FamilyChartInput, description: string) {
  const x = altitudeChannel(input);
  const y: Channel = {
    field: 'nu',
    title: 'in-plane index ν (symlog scale)',
    scale: { type: 'symlog', constant: 1 },
    axis: { values: symlogTicks(input.members.map((m) => m.nu)), labelExpr: SYMLOG_LABEL_EXPR },
  };
  const inPlane = input.bifurcations.filter((b) => b.plane === 'in-plane');
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    description,
    width: CHART_WIDTH,
    height: CHART_HEIGHT,
    config: chartConfig,
    // Empty layers are left out (vega warns about the infinite extent of an empty field).
    layer: [
      bandLayer(y),
      ...(input.windows.length > 0 ? [windowLayer(input.windows, x, 'fromAltKm', 'toAltKm')] : []),
      familyLineLayer(input.members, x, y),
      memberLayer(input.members, x, y, (m) => Math.abs(m.nu) < 1, input.secondaryName),
      ...(inPlane.length > 0 ? [bifurcationLayer(inPlane, 'altKm', x, y, (b) => (b.kind === 'tangent' ? 1 : -1))] : []),
    ],
  };
}
