// chart-images/<family>/stability.svg: the family's stability chart as a file every member page shares.
import type { APIRoute, GetStaticPaths } from 'astro';
import { loadCatalog } from '../../lib/catalog-source.ts';
import { familyStabilityChart } from '../../lib/family-stability-chart.ts';
import { idToPath } from '../../lib/id-path.ts';
import { withoutLinks } from '../../lib/render-chart.ts';

export const getStaticPaths = (() =>
  loadCatalog().families.map((f) => ({ params: { path: `${idToPath(f.id)}/stability.svg` }, props: { familyId: f.id } }))) satisfies GetStaticPaths;

export const GET: APIRoute = async ({ props }) => {
  const chart = await familyStabilityChart(loadCatalog(), (props as { familyId: string }).familyId);
  return new Response(withoutLinks(chart.rendered.svg), { headers: { 'Content-Type': 'image/svg+xml' } });
};
