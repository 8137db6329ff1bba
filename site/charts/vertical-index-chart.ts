// Vertical (out-of-plane) stability index ν_z against minimum altitude, symlog y, with its |ν_z| < 1 band
// and the vertical bifurcations.
import { altitudeChannel } from './altitude-channel.ts';
import type { FamilyChartInput } from './chart-input.ts';
import { CHART_HEIGHT, CHART_WIDTH, SYMLOG_LABEL_EXPR, chartConfig, symlogTicks } from './chart-style.ts';
import { bandLayer, bifurcationLayer, familyLineLayer, memberLayer, type Channel } from './family-chart-layers.ts';

export function verticalIndexChart(input: FamilyChartInput, description: string) {
  const x = altitudeChannel(input);
  const y: Channel = {
    field: 'nuV',
    title: 'vertical index ν_z (symlog scale)',
    scale: { type: 'symlog', constant: 1 },
    axis: { values: symlogTicks(input.members.map((m) => m.nuV)), labelExpr: SYMLOG_LABEL_EXPR },
  };
  const vertical = input.bifurcations.filter((b) => b.plane === 'vertical');
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    description,
    width: CHART_WIDTH,
    height: CHART_HEIGHT,
    config: chartConfig,
    // Empty layers are left out (vega warns about the infinite extent of an empty field).
    layer: [
      bandLayer(y),
      familyLineLayer(input.members, x, y),
      memberLayer(input.members, x, y, (m) => Math.abs(m.nuV) < 1, input.secondaryName),
      ...(vertical.length > 0 ? [bifurcationLayer(vertical, 'altKm', x, y, (b) => (b.kind === 'tangent' ? 1 : -1))] : []),
    ],
  };
}
