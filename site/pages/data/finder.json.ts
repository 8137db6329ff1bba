// data/finder.json: the finder's column file (only the finder page loads it).
import type { APIRoute } from 'astro';
import { loadCatalog } from '../../lib/catalog-source.ts';
import { finderData } from '../../lib/finder-data.ts';

export const GET: APIRoute = () =>
  new Response(JSON.stringify(finderData(loadCatalog())), { headers: { 'Content-Type': 'application/json' } });
