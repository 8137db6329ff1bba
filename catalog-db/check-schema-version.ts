// Refuses a catalog written with another table layout, in one line that says what to do.
import type { Database } from 'better-sqlite3';
import { CATALOG_SCHEMA_VERSION } from './schema-version.ts';

export function assertCatalogSchemaVersion(db: Database, path: string): void {
  const found = db.pragma('user_version', { simple: true }) as number;
  if (found !== CATALOG_SCHEMA_VERSION) {
    throw new Error(
      `catalog ${path} has schema version ${found}, this cycler-atlas needs ${CATALOG_SCHEMA_VERSION} ` +
        '(regenerate it or use a matching version)',
    );
  }
}
