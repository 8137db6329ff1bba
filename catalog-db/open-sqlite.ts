// Opens the SQLite file behind a catalog with the connection settings every user needs, and turns
// the driver's terse failures (missing file, not a database, old layout) into one-line errors.
import { closeSync, existsSync, openSync, readSync } from 'node:fs';
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

/** Closes a connection opened for writing. The file goes back to a rollback journal first (when no one
 *  else has it open), so that a finished catalog is one self-contained file that readers can open on
 *  read-only storage: a WAL-mode file needs a -shm file beside it even to be read. */
export function closeWritable(db: Database.Database): void {
  try {
    db.pragma('journal_mode = DELETE');
  } catch {
    // Busy: another connection still reads it; the file stays in WAL mode until a later close.
  }
  db.close();
}

export function openSqliteForRead(path: string): Database.Database {
  if (!existsSync(path)) throw new Error(`catalog ${path} does not exist`);
  try {
    return withCleanup(new Database(path, { readonly: true, fileMustExist: true }), path, (db) => {
      assertCatalogSchemaVersion(db, path);
    });
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    if (!/readonly database|unable to open/.test(message) || !isWalModeFile(path)) throw error;
    // A WAL-mode file (left by a run that did not finish) cannot be read where its -shm file cannot be made.
    throw new Error(`${message} (the file is in write-ahead mode, left by a run that did not finish, and its directory is read-only: open it once where it can be written, e.g. with verify)`, { cause: error });
  }
}

/** Byte 18 of an SQLite header is the read format version: 2 is WAL (sqlite.org/fileformat.html). */
function isWalModeFile(path: string): boolean {
  const header = Buffer.alloc(20);
  const fd = openSync(path, 'r');
  try {
    return readSync(fd, header, 0, 20, 0) === 20 && header[18] === 2;
  } finally {
    closeSync(fd);
  }
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
