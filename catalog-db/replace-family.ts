// Deletes a family (its orbits, windows, bifurcations, hold radii, model screenings and signature changes go with it by
// ON DELETE CASCADE) and inserts the new bundle. Opens no transaction itself: callers wrap it so that it is all or nothing.
import type { Database } from 'better-sqlite3';
import {
  bifurcationTable,
  familyTable,
  holdRadiusTable,
  modelScreeningTable,
  orbitTable,
  signatureChangeTable,
  stableWindowTable,
} from './table-columns.ts';
import type { FamilyBundle } from './types.ts';
import { assertBundleConsistent } from './validate-bundle.ts';

export type ReplaceFamily = (bundle: FamilyBundle) => void;

/** Prepares the statements once and returns the function that uses them. */
export function prepareReplaceFamily(db: Database): ReplaceFamily {
  const deleteFamily = db.prepare('DELETE FROM families WHERE id = ?');
  const insertFamily = db.prepare(familyTable.insertSql);
  const insertOrbit = db.prepare(orbitTable.insertSql);
  const insertWindow = db.prepare(stableWindowTable.insertSql);
  const insertBifurcation = db.prepare(bifurcationTable.insertSql);
  const insertHoldRadius = db.prepare(holdRadiusTable.insertSql);
  const insertScreening = db.prepare(modelScreeningTable.insertSql);
  const insertSignatureChange = db.prepare(signatureChangeTable.insertSql);
  const systemExists = db.prepare('SELECT 1 FROM systems WHERE id = ?').pluck();
  const runExists = db.prepare('SELECT 1 FROM runs WHERE id = ?').pluck();

  return (bundle) => {
    assertBundleConsistent(bundle);
    const { family } = bundle;
    // Checked here because SQLite would only say "FOREIGN KEY constraint failed".
    if (systemExists.get(family.systemId) === undefined) {
      throw new Error(`family ${family.id}: systemId ${family.systemId} is not in the catalog (upsertSystem first)`);
    }
    if (runExists.get(family.runId) === undefined) {
      throw new Error(`family ${family.id}: runId ${family.runId} is not in the catalog (startRun first)`);
    }
    deleteFamily.run(family.id);
    insertFamily.run(familyTable.toRecord(family));
    for (const orbit of bundle.orbits) insertOrbit.run(orbitTable.toRecord(orbit));
    for (const window of bundle.stableWindows) insertWindow.run(stableWindowTable.toRecord(window));
    for (const bifurcation of bundle.bifurcations) insertBifurcation.run(bifurcationTable.toRecord(bifurcation));
    for (const row of bundle.holdRadii ?? []) insertHoldRadius.run(holdRadiusTable.toRecord(row));
    for (const row of bundle.modelScreenings ?? []) insertScreening.run(modelScreeningTable.toRecord(row));
    for (const row of bundle.signatureChanges ?? []) insertSignatureChange.run(signatureChangeTable.toRecord(row));
  };
}
