// Entry points: open a catalog file for the generator (write) or for the site and export (read).
import { openSqliteForRead, openSqliteForWrite } from './open-sqlite.ts';
import { createCatalogReader } from './query.ts';
import type { CatalogReader, CatalogWriter } from './types.ts';
import { createCatalogWriter } from './write-catalog.ts';

/** Creates the file and its schema if new; WAL mode, foreign keys on. */
export function openCatalogForWrite(path: string): CatalogWriter {
  return createCatalogWriter(openSqliteForWrite(path));
}

/** Read-only; fails with a one-line error if the file is missing or has another schema version. */
export function openCatalogForRead(path: string): CatalogReader {
  return createCatalogReader(openSqliteForRead(path));
}
