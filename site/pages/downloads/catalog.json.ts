// downloads/catalog.json: the whole catalog through catalog-db's JSON export.
import type { APIRoute } from 'astro';
import { exportCatalogJson } from '../../../catalog-db/export-catalog.ts';
import { openCatalogForRead } from '../../../catalog-db/open-catalog.ts';
import { catalogDbPath } from '../../lib/catalog-source.ts';

export const GET: APIRoute = () => {
  const reader = openCatalogForRead(catalogDbPath());
  try {
    return new Response(JSON.stringify(exportCatalogJson(reader)), { headers: { 'Content-Type': 'application/json' } });
  } finally {
    reader.close();
  }
};
