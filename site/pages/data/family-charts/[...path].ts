// data/family-charts/<family>/specs.json: the Vega-Lite specs of a family's charts by key, and the zoom
// span of each stable window, which the family page loads with the chart runtime only when a reader first
// points at or focuses a chart (or asks for a window's zoom).
import type { APIRoute, GetStaticPaths } from 'astro';
import { zoomSpanJacobi, zoomSpanKm } from '../../../charts/window-zoom-chart.ts';
import { loadCatalog } from '../../../lib/catalog-source.ts';
import { familyChartInput } from '../../../lib/family-chart-input.ts';
import type { FamilyChartsFile } from '../../../lib/family-charts-file.ts';
import { familyChartSpecsOf } from '../../../lib/family-stability-chart.ts';
import { idToPath } from '../../../lib/id-path.ts';
import { windowSpanLabel } from '../../../charts/window-label.ts';

export const getStaticPaths = (() =>
  loadCatalog().families.map((f) => ({ params: { path: `${idToPath(f.id)}/specs.json` }, props: { familyId: f.id } }))) satisfies GetStaticPaths;

export const GET: APIRoute = ({ props }) => {
  const catalog = loadCatalog();
  const { familyId } = props as { familyId: string };
  const input = familyChartInput(catalog, familyId);
  const file: FamilyChartsFile = {
    specs: Object.fromEntries(familyChartSpecsOf(catalog, familyId).map((c) => [c.key, c.spec])),
    windows: input.windows.map((w, i) => ({ label: windowSpanLabel(w, i), altKm: zoomSpanKm(w), jacobi: zoomSpanJacobi(w) })),
  };
  return new Response(JSON.stringify(file), { headers: { 'Content-Type': 'application/json' } });
};
