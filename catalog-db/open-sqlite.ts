// Opens the SQLite file behind a catalog with the connection settings every user needs, and turns
// the driver's terse failures (missing file, not a database, old layout) into one-line errors.
import { existsSync } from 'node:fs';
import { dirname } from 'node:path';
import Database from 'better-sqlite3';
import { assertCatalogSchemaVersion } from './check-schema-version.ts';
import { createSchemaIfEmpty } from './create-schema.ts';

/** Creates the file and its tables when new. WAL lets the site read while the generator writes. */
export function openSqliteForWrite(path: string): Database.Database {
  if (!existsSync(dirname(path))) {
    throw new Error(`catalog ${path} cannot be created: directory ${dirname(path)} does not exist`);
  }
  return withCleanup(new Database(path, { timeout: 10_000 }), path, (db) => {
    db.pragma('journal_mode = WAL');
    db.pragma('foreign_keys = ON');
    createSchemaIfEmpty(db);
    assertCatalogSchemaVersion(db, path);
  });
}

export function openSqliteForRead(path: string): Database.Database {
  if (!existsSync(path)) throw new Error(`catalog ${path} does not exist`);
  return withCleanup(new Database(path, { readonly: true, fileMustExist: true }), path, (db) => {
    assertCatalogSchemaVersion(db, path);
  });
}

/** Runs the setup; on failure closes the connection and reports which file was at fault. */
function withCleanup(
  db: Database.Database,
  path: string,
  setup: (db: Database.Database) => void,
): Database.Database {
  try {
    setup(db);
    return db;
  } catch (error) {
    db.close();
    const message = error instanceof Error ? error.message : String(error);
    if (message.startsWith(`catalog ${path} `)) throw error;
    throw new Error(`catalog ${path} cannot be opened: ${message}`, { cause: error });
  }
}
