// downloads/catalog.sqlite: the catalog file itself, copied into the site at build.
import { readFileSync } from 'node:fs';
import type { APIRoute } from 'astro';
import { catalogDbPath } from '../../lib/catalog-source.ts';

export const GET: APIRoute = () =>
  new Response(readFileSync(catalogDbPath()), { headers: { 'Content-Type': 'application/vnd.sqlite3' } });
