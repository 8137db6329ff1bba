// chart-images/<family>/<chart>.svg: each family chart as a file. The family page shows them as images
// (readable without JavaScript, out of the page's HTML); every member page shares the stability one.
import type { APIRoute, GetStaticPaths } from 'astro';
import { loadCatalog } from '../../lib/catalog-source.ts';
import { familyCharts } from '../../lib/family-stability-chart.ts';
import { familyChartSpecsOf } from '../../lib/family-stability-chart.ts';
import { idToPath } from '../../lib/id-path.ts';
import { withoutLinks } from '../../lib/render-chart.ts';

export const getStaticPaths = (() => {
  const catalog = loadCatalog();
  return catalog.families.flatMap((f) =>
    familyChartSpecsOf(catalog, f.id).map((c) => ({ params: { path: `${idToPath(f.id)}/${c.key}.svg` }, props: { familyId: f.id, key: c.key } })));
}) satisfies GetStaticPaths;

export const GET: APIRoute = async ({ props }) => {
  const { familyId, key } = props as { familyId: string; key: string };
  const chart = (await familyCharts(loadCatalog(), familyId)).find((c) => c.key === key)!;
  return new Response(withoutLinks(chart.rendered.svg), { headers: { 'Content-Type': 'image/svg+xml' } });
};
