// Read side of the catalog (CatalogReader) over an open connection; statements are prepared once
// because the site build calls orbits(familyId) once per family page.
import type { Database } from 'better-sqlite3';
import { prepareAuditStore } from './audit-store.ts';
import { prepareMetaStore } from './meta.ts';
import type { SqlRecord } from './row-mapping.ts';
import {
  bifurcationTable,
  familyTable,
  holdRadiusTable,
  modelScreeningTable,
  orbitTable,
  runTable,
  signatureChangeTable,
  stableWindowTable,
  systemTable,
} from './table-columns.ts';
import type { CatalogReader, StoredJobSettings } from './types.ts';

/** The reader owns the connection: close() closes it. */
export function createCatalogReader(db: Database): CatalogReader {
  const all = (sql: string) => {
    const statement = db.prepare(sql);
    return (...params: unknown[]) => statement.all(...params) as SqlRecord[];
  };
  const one = (sql: string) => {
    const statement = db.prepare(sql);
    return (...params: unknown[]) => statement.get(...params) as SqlRecord | undefined;
  };
  const q = {
    systems: all('SELECT * FROM systems ORDER BY id'),
    runs: all('SELECT * FROM runs ORDER BY started_at DESC, id DESC'),
    families: all('SELECT * FROM families ORDER BY system_id, signature, id'),
    family: one('SELECT * FROM families WHERE id = ?'),
    allOrbits: all('SELECT * FROM orbits ORDER BY family_id, seq'),
    familyOrbits: all('SELECT * FROM orbits WHERE family_id = ? ORDER BY seq'),
    orbit: one('SELECT * FROM orbits WHERE id = ?'),
    allWindows: all('SELECT * FROM stable_windows ORDER BY family_id, from_arclength, id'),
    familyWindows: all('SELECT * FROM stable_windows WHERE family_id = ? ORDER BY from_arclength, id'),
    allBifurcations: all('SELECT * FROM bifurcations ORDER BY family_id, arclength, id'),
    familyBifurcations: all('SELECT * FROM bifurcations WHERE family_id = ? ORDER BY arclength, id'),
    allHoldRadii: all(`SELECT h.* FROM hold_radii AS h JOIN orbits AS o ON o.id = h.orbit_id ORDER BY h.family_id, o.seq`),
    familyHoldRadii: all(`SELECT h.* FROM hold_radii AS h JOIN orbits AS o ON o.id = h.orbit_id
      WHERE h.family_id = ? ORDER BY o.seq`),
    allScreenings: all(`SELECT m.* FROM model_screenings AS m JOIN orbits AS o ON o.id = m.orbit_id
      ORDER BY m.family_id, o.seq, m.model`),
    familyScreenings: all(`SELECT m.* FROM model_screenings AS m JOIN orbits AS o ON o.id = m.orbit_id
      WHERE m.family_id = ? ORDER BY o.seq, m.model`),
    allSignatureChanges: all('SELECT * FROM signature_changes ORDER BY family_id, side DESC'),
    familySignatureChanges: all('SELECT * FROM signature_changes WHERE family_id = ? ORDER BY side DESC'),
    jobs: all('SELECT job_key, run_id, done_at, settings FROM jobs ORDER BY job_key'),
  };
  const meta = prepareMetaStore(db);
  const auditStore = prepareAuditStore(db);
  return {
    systems: () => q.systems().map(systemTable.fromRecord),
    runs: () => q.runs().map(runTable.fromRecord),
    families: () => q.families().map(familyTable.fromRecord),
    family: (id) => mapOptional(q.family(id), familyTable.fromRecord),
    orbits: (familyId) =>
      (familyId === undefined ? q.allOrbits() : q.familyOrbits(familyId)).map(orbitTable.fromRecord),
    orbit: (id) => mapOptional(q.orbit(id), orbitTable.fromRecord),
    stableWindows: (familyId) =>
      (familyId === undefined ? q.allWindows() : q.familyWindows(familyId)).map(stableWindowTable.fromRecord),
    bifurcations: (familyId) =>
      (familyId === undefined ? q.allBifurcations() : q.familyBifurcations(familyId)).map(
        bifurcationTable.fromRecord,
      ),
    holdRadii: (familyId) =>
      (familyId === undefined ? q.allHoldRadii() : q.familyHoldRadii(familyId)).map(holdRadiusTable.fromRecord),
    modelScreenings: (familyId) =>
      (familyId === undefined ? q.allScreenings() : q.familyScreenings(familyId)).map(modelScreeningTable.fromRecord),
    signatureChanges: (familyId) =>
      (familyId === undefined ? q.allSignatureChanges() : q.familySignatureChanges(familyId)).map(signatureChangeTable.fromRecord),
    scenario: () => meta.getScenario(),
    jobSettings: () =>
      q.jobs().map(
        (record): StoredJobSettings => ({
          jobKey: record.job_key as string,
          runId: record.run_id as number,
          doneAt: record.done_at as string,
          settings: JSON.parse(record.settings as string) as StoredJobSettings['settings'],
        }),
      ),
    audits: () => auditStore.audits(),
    latestAudit: () => auditStore.latestAudit(),
    close: () => db.close(),
  };
}

function mapOptional<T>(record: SqlRecord | undefined, map: (record: SqlRecord) => T): T | undefined {
  return record === undefined ? undefined : map(record);
}
