// The envelope every family chart shares: schema, size, style; empty layers are left out
// (vega warns about the infinite extent of an empty field).
import { CHART_HEIGHT, CHART_WIDTH, chartConfig } from './chart-style.ts';

export function familyChartSpec(description: string, layers: Array<object | null>) {
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    description,
    width: CHART_WIDTH,
    height: CHART_HEIGHT,
    config: chartConfig,
    layer: layers.filter((layer): layer is object => layer !== null),
  };
}
