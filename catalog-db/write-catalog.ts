// Write side of the catalog (CatalogWriter) over an open connection. Every method is one
// transaction; statements are prepared once.
import type { Database } from 'better-sqlite3';
import { prepareAuditStore } from './audit-store.ts';
import { jobSettingsJson } from './job-settings.ts';
import { prepareMetaStore } from './meta.ts';
import { closeWritable } from './open-sqlite.ts';
import { prepareReplaceFamily } from './replace-family.ts';
import { runTable, systemTable } from './table-columns.ts';
import type { CatalogWriter, JobWithSettings } from './types.ts';

/** The writer owns the connection: close() closes it. */
export function createCatalogWriter(db: Database): CatalogWriter {
  const nonKeyColumns = systemTable.columns.filter((column) => column !== 'id');
  const upsertSystem = db.prepare(
    `${systemTable.insertSql} ON CONFLICT (id) DO UPDATE SET ${nonKeyColumns.map((c) => `${c} = excluded.${c}`).join(', ')}`,
  );
  const insertRun = db.prepare(runTable.insertSql);
  const finishRun = db.prepare('UPDATE runs SET finished_at = ? WHERE id = ?');
  const runExists = db.prepare('SELECT 1 FROM runs WHERE id = ?').pluck();
  const jobDone = db.prepare('SELECT 1 FROM jobs WHERE job_key = ?').pluck();
  const upsertJob = db.prepare(
    'INSERT INTO jobs (job_key, run_id, done_at, settings) VALUES (?, ?, ?, ?) ' +
      'ON CONFLICT (job_key) DO UPDATE SET run_id = excluded.run_id, done_at = excluded.done_at, settings = excluded.settings',
  );
  const deleteSystemFamilies = db.prepare('DELETE FROM families WHERE system_id = ?');
  const deleteJobFamilies = db.prepare('DELETE FROM families WHERE config_key = ?');
  const deleteJob = db.prepare('DELETE FROM jobs WHERE job_key = ?');
  const forgetTransaction = db.transaction((systemIds: readonly string[], jobKeys: readonly string[]) => {
    let families = 0;
    let jobs = 0;
    for (const id of systemIds) families += deleteSystemFamilies.run(id).changes;
    for (const key of jobKeys) {
      families += deleteJobFamilies.run(key).changes;
      jobs += deleteJob.run(key).changes;
    }
    return { families, jobs };
  });
  const linkSignatureChange = db.prepare('UPDATE signature_changes SET into_family_id = ?, followed_up = ? WHERE family_id = ? AND side = ?');
  const replaceFamily = prepareReplaceFamily(db);
  const meta = prepareMetaStore(db);
  const audits = prepareAuditStore(db);

  const markJob = (job: JobWithSettings, runId: number, where: string) => {
    const settings = jobSettingsJson(job, where);
    if (runExists.get(runId) === undefined) throw new Error(`${where}: runId ${runId} is not in the catalog`);
    upsertJob.run(job.key, runId, new Date().toISOString(), settings);
  };

  const writeFamilyTransaction = db.transaction((bundle: Parameters<CatalogWriter['writeFamily']>[0], job?: JobWithSettings) => {
    replaceFamily(bundle);
    if (job !== undefined) markJob(job, bundle.family.runId, 'completesJob');
  });

  return {
    upsertSystem(system) {
      upsertSystem.run(systemTable.toRecord(system));
    },
    startRun(run) {
      const record = runTable.toRecord({ ...run, id: 0, finishedAt: null });
      record.id = null; // NULL lets SQLite pick the next id
      return Number(insertRun.run(record).lastInsertRowid);
    },
    finishRun(runId, finishedAtIso) {
      if (typeof finishedAtIso !== 'string' || Number.isNaN(Date.parse(finishedAtIso))) {
        throw new Error(`finishRun: finishedAtIso must be an ISO 8601 date-time, got ${String(finishedAtIso)}`);
      }
      if (finishRun.run(finishedAtIso, runId).changes === 0) {
        throw new Error(`finishRun: runId ${runId} is not in the catalog`);
      }
    },
    jobDone(jobKey) {
      return jobDone.get(jobKey) !== undefined;
    },
    writeFamily(bundle, completesJob) {
      try {
        writeFamilyTransaction(bundle, completesJob);
      } catch (error) {
        const message = error instanceof Error ? error.message : String(error);
        throw new Error(`writeFamily ${bundle?.family?.id}: nothing written (${message})`, { cause: error });
      }
    },
    markJobDone(job, runId) {
      db.transaction(() => markJob(job, runId, 'markJobDone'))();
    },
    linkSignatureChange(familyId, side, link) {
      if (linkSignatureChange.run(link.intoFamilyId, link.followedUp ? 1 : 0, familyId, side).changes === 0) {
        throw new Error(`linkSignatureChange: family ${familyId} has no signature change at its ${side}`);
      }
    },
    setScenario(scenario) {
      meta.setScenario(scenario);
    },
    writeAudit(audit) {
      return audits.writeAudit(audit);
    },
    forgetResults({ systemIds, jobKeys }) {
      return forgetTransaction.immediate(systemIds, jobKeys);
    },
    close() {
      closeWritable(db);
    },
  };
}
