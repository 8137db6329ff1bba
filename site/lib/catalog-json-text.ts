// The text of downloads/catalog.json (catalog-db's JSON export), for the route that serves it and for the
// size the pages state beside its links.
import { exportCatalogJson } from '../../catalog-db/export-catalog.ts';
import { openCatalogForRead } from '../../catalog-db/open-catalog.ts';
import { catalogDbPath } from './catalog-source.ts';

let cached: string | undefined;

export function catalogJsonText(): string {
  if (cached !== undefined) return cached;
  const reader = openCatalogForRead(catalogDbPath());
  try {
    cached = JSON.stringify(exportCatalogJson(reader));
    return cached;
  } finally {
    reader.close();
  }
}
