// Each family's charts are rendered once per build and reused: the stability chart by every member's page
// (a shared SVG file with that member marked from the chart's own scales), all of them by the family page
// and by the chart files it references (chart-images/<family>/<key>.svg).
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
const allCache = new Map<string, Promise<RenderedFamilyChart[]>>();

function specsOf(catalog: CatalogSnapshot, familyId: string): FamilyChartSpec[] {
  return familyChartSpecs(familyChartInput(catalog, familyId));
}

const cacheKey = (catalog: CatalogSnapshot, familyId: string) => `${catalog.dbPath}\n${familyId}`;

export function familyStabilityChart(catalog: CatalogSnapshot, familyId: string): Promise<RenderedFamilyChart> {
  const key = cacheKey(catalog, familyId);
  let chart = stabilityCache.get(key);
  if (!chart) {
    const spec = specsOf(catalog, familyId).find((c) => c.key === 'stability')!;
    chart = renderChart(spec.spec).then((rendered) => ({ ...spec, rendered }));
    stabilityCache.set(key, chart);
  }
  return chart;
}

/** The family chart specs without rendering (for the specs file the browser loads). */
export function familyChartSpecsOf(catalog: CatalogSnapshot, familyId: string): FamilyChartSpec[] {
  const holdInput = holdRadiusChartInput(catalog, familyId);
  return [...specsOf(catalog, familyId), ...(holdInput ? [holdRadiusChartSpec(holdInput)] : [])];
}

/** The four charts of a family page (the stability one from its cache), and the hold-radius one when
 *  members were screened. */
export function familyCharts(catalog: CatalogSnapshot, familyId: string): Promise<RenderedFamilyChart[]> {
  const key = cacheKey(catalog, familyId);
  let charts = allCache.get(key);
  if (!charts) {
    charts = (async () => {
      const stability = await familyStabilityChart(catalog, familyId);
      const others = familyChartSpecsOf(catalog, familyId).filter((c) => c.key !== 'stability');
      const rendered = await Promise.all(others.map(async (c) => ({ ...c, rendered: await renderChart(c.spec) })));
      return [stability, ...rendered];
    })();
    allCache.set(key, charts);
  }
  return charts;
}
