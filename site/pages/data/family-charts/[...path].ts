// data/family-charts/<family>/specs.json: the Vega-Lite specs of a family's charts, by chart key, which
// the family page loads with the chart runtime only when a reader first points at or focuses a chart.
import type { APIRoute, GetStaticPaths } from 'astro';
import { loadCatalog } from '../../../lib/catalog-source.ts';
import { familyChartSpecsOf } from '../../../lib/family-stability-chart.ts';
import { idToPath } from '../../../lib/id-path.ts';

export const getStaticPaths = (() =>
  loadCatalog().families.map((f) => ({ params: { path: `${idToPath(f.id)}/specs.json` }, props: { familyId: f.id } }))) satisfies GetStaticPaths;

export const GET: APIRoute = ({ props }) => {
  const specs = familyChartSpecsOf(loadCatalog(), (props as { familyId: string }).familyId);
  return new Response(JSON.stringify(Object.fromEntries(specs.map((c) => [c.key, c.spec]))), { headers: { 'Content-Type': 'application/json' } });
};
