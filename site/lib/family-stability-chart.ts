// Each family's in-plane stability chart is rendered once per build and reused: inline on the family page,
// as a shared SVG file on every member's page, with that member marked from the chart's own scales.
import type { FamilyChartSpec } from '../charts/family-charts.ts';
import { familyChartSpecs, holdRadiusChartSpec } from '../charts/family-charts.ts';
import type { CatalogSnapshot } from './catalog-source.ts';
import { familyChartInput } from './family-chart-input.ts';
import { holdRadiusChartInput } from './hold-radius-chart-input.ts';
import { renderChart, type RenderedChart } from './render-chart.ts';

export interface RenderedFamilyChart extends FamilyChartSpec {
  rendered: RenderedChart;
}

const stabilityCache = new Map<string, Promise<RenderedFamilyChart>>();

function specsOf(catalog: CatalogSnapshot, familyId: string): FamilyChartSpec[] {
  return familyChartSpecs(familyChartInput(catalog, familyId));
}

export function familyStabilityChart(catalog: CatalogSnapshot, familyId: string): Promise<RenderedFamilyChart> {
  const key = `${catalog.dbPath}\n${familyId}`;
  let chart = stabilityCache.get(key);
  if (!chart) {
    const spec = specsOf(catalog, familyId).find((c) => c.key === 'stability')!;
    chart = renderChart(spec.spec).then((rendered) => ({ ...spec, rendered }));
    stabilityCache.set(key, chart);
  }
  return chart;
}

/** The four charts of a family page (the stability one from the cache), and the hold-radius one when
 *  members were screened. */
export async function familyCharts(catalog: CatalogSnapshot, familyId: string): Promise<RenderedFamilyChart[]> {
  const stability = await familyStabilityChart(catalog, familyId);
  const holdInput = holdRadiusChartInput(catalog, familyId);
  const others = [
    ...specsOf(catalog, familyId).filter((c) => c.key !== 'stability'),
    ...(holdInput ? [holdRadiusChartSpec(holdInput)] : []),
  ];
  const rendered = await Promise.all(others.map(async (c) => ({ ...c, rendered: await renderChart(c.spec) })));
  return [stability, ...rendered];
}
