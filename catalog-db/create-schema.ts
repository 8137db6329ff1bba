// Lays out the tables of a new, empty catalog file and stamps it with the schema version.
import { readFileSync } from 'node:fs';
import type { Database } from 'better-sqlite3';
import { CATALOG_SCHEMA_VERSION } from './schema-version.ts';

/** Read when first needed, so that read-only users (the site build) never touch schema.sql. */
let schemaSql: string | undefined;

function loadSchemaSql(): string {
  schemaSql ??= readFileSync(new URL('./schema.sql', import.meta.url), 'utf8');
  return schemaSql;
}

/** Creates the schema when the file holds no tables and no version yet; otherwise does nothing.
 *  IMMEDIATE so that two processes creating the same file cannot both lay out the tables. */
export function createSchemaIfEmpty(db: Database): void {
  db.transaction(() => {
    const tableCount = (db.prepare('SELECT count(*) AS n FROM sqlite_schema').get() as { n: number }).n;
    const version = db.pragma('user_version', { simple: true }) as number;
    if (tableCount > 0 || version !== 0) return;
    db.exec(loadSchemaSql());
    db.pragma(`user_version = ${CATALOG_SCHEMA_VERSION}`);
  }).immediate();
}
