// Opening catalogs: new files get the schema and its version, connection settings are as promised,
// and a wrong version, a missing file or a file that is not SQLite fail with a one-line error.
import { writeFileSync } from 'node:fs';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { openCatalogForRead, openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import { openSqliteForRead, openSqliteForWrite } from '../../catalog-db/open-sqlite.ts';
import { columnName } from '../../catalog-db/row-mapping.ts';
import { CATALOG_SCHEMA_VERSION } from '../../catalog-db/schema-version.ts';
import {
  bifurcationTable,
  familyTable,
  holdRadiusTable,
  modelScreeningTable,
  orbitTable,
  runTable,
  stableWindowTable,
  systemTable,
} from '../../catalog-db/table-columns.ts';
import { makeSystem } from './make-rows.ts';
import { useTempCatalogDir } from './temp-catalog-path.ts';

const catalogPath = useTempCatalogDir();

describe('opening a catalog', () => {
  it('creates the schema once, stamped with the schema version, in WAL mode with foreign keys on', () => {
    const path = catalogPath('new.sqlite');
    openCatalogForWrite(path).close();
    const db = openSqliteForWrite(path); // a second open must not try to create the tables again
    expect(db.pragma('user_version', { simple: true })).toBe(CATALOG_SCHEMA_VERSION);
    expect(db.pragma('journal_mode', { simple: true })).toBe('wal');
    expect(db.pragma('foreign_keys', { simple: true })).toBe(1);
    const tables = db.prepare("SELECT name FROM sqlite_schema WHERE type = 'table' ORDER BY name").pluck().all();
    expect(tables).toEqual(['audits', 'bifurcations', 'families', 'hold_radii', 'jobs', 'meta', 'model_screenings', 'orbits', 'runs', 'signature_changes', 'stable_windows', 'systems']);
    // The site reads a family's members by (family_id, seq); the plan must use the index, not a scan.
    const plan = db
      .prepare("EXPLAIN QUERY PLAN SELECT * FROM orbits WHERE family_id = 'x' ORDER BY seq")
      .all() as Array<{ detail: string }>;
    expect(plan.map((p) => p.detail).join(' | ')).toMatch(/USING INDEX orbits_by_family_seq/);
    db.close();
  });

  it('maps every row field to a column of schema.sql and every column to a field', () => {
    const db = new Database(catalogPath('new.sqlite'), { readonly: true });
    for (const table of [systemTable, runTable, familyTable, orbitTable, stableWindowTable, bifurcationTable, holdRadiusTable, modelScreeningTable]) {
      const columns = (db.pragma(`table_info(${table.table})`) as Array<{ name: string }>).map((c) => c.name);
      expect([...table.columns].sort(), table.table).toEqual([...columns].sort());
    }
    db.close();
    expect(columnName('secondaryMinAltKm')).toBe('secondary_min_alt_km');
    expect(columnName('l1Passages')).toBe('l1_passages');
  });

  it('refuses another schema version with the one-line message, for reading and for writing', () => {
    const path = catalogPath('old.sqlite');
    openCatalogForWrite(path).close();
    const raw = new Database(path);
    raw.pragma('user_version = 999');
    raw.close();
    const expected = `catalog ${path} has schema version 999, this cycler-atlas needs ${CATALOG_SCHEMA_VERSION} (regenerate it or use a matching version)`;
    expect(() => openCatalogForRead(path)).toThrow(expected);
    expect(() => openCatalogForWrite(path)).toThrow(expected);
    try {
      openCatalogForRead(path);
    } catch (error) {
      expect((error as Error).message).toBe(expected);
    }
  });

  it('refuses an SQLite file that is not a catalog (tables but no version) instead of adding tables to it', () => {
    const path = catalogPath('foreign.sqlite');
    const raw = new Database(path);
    raw.exec('CREATE TABLE something_else (x)');
    raw.close();
    expect(() => openCatalogForWrite(path)).toThrow(`catalog ${path} has schema version 0, this cycler-atlas needs`);
  });

  it('names the file when it is missing, not a database, or in a missing directory', () => {
    const missing = catalogPath('missing.sqlite');
    expect(() => openCatalogForRead(missing)).toThrow(`catalog ${missing} does not exist`);
    const text = catalogPath('text.sqlite');
    writeFileSync(text, 'this is not an SQLite database, just some text long enough to have a header.'.repeat(10));
    expect(() => openCatalogForRead(text)).toThrow(`catalog ${text} cannot be opened: file is not a database`);
    expect(() => openCatalogForWrite(text)).toThrow(`catalog ${text} cannot be opened: file is not a database`);
    const nested = catalogPath('no/such/dir/x.sqlite');
    expect(() => openCatalogForWrite(nested)).toThrow(`catalog ${nested} cannot be created: directory`);
  });

  it('opens read-only: the reader cannot change the file', () => {
    const path = catalogPath('readonly.sqlite');
    const writer = openCatalogForWrite(path);
    writer.upsertSystem(makeSystem());
    writer.close();
    const reader = openCatalogForRead(path);
    expect(reader.systems()).toHaveLength(1);
    reader.close();
    const db = openSqliteForRead(path); // the connection openCatalogForRead wraps
    expect(db.readonly).toBe(true);
    expect(() => db.exec('DELETE FROM systems')).toThrow(/readonly/);
    db.close();
  });
});
