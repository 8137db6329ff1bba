// The audits table: writing a finished audit and reading audits back (newest first). Levels and misses
// are JSON text; the row is mapped by hand because both are nested.
import type { Database } from 'better-sqlite3';
import type { AuditRow } from './audit-types.ts';
import type { SqlRecord } from './row-mapping.ts';

export interface AuditStore {
  /** Newest first (by finished_at, then id). */
  audits(): AuditRow[];
  latestAudit(): AuditRow | undefined;
  /** Only on a writable connection; returns the new audit's id. */
  writeAudit(audit: Omit<AuditRow, 'id'>): number;
}

const SELECT_NEWEST = 'SELECT * FROM audits ORDER BY finished_at DESC, id DESC';

function fromRecord(record: SqlRecord): AuditRow {
  return {
    id: record.id as number,
    finishedAt: record.finished_at as string,
    seconds: record.seconds as number,
    seed: record.seed as number,
    levelsPerSystem: record.levels_per_system as number,
    gridFactor: record.grid_factor as number,
    levels: JSON.parse(record.levels as string) as AuditRow['levels'],
    jobsAudited: record.jobs_audited as number,
    orbitsChecked: record.orbits_checked as number,
    misses: JSON.parse(record.misses as string) as AuditRow['misses'],
  };
}

function checkedJson(audit: Omit<AuditRow, 'id'>): { levels: string; misses: string } {
  const finite = (value: number, field: string) => {
    if (!Number.isFinite(value)) throw new Error(`writeAudit: ${field} must be a finite number, got ${value}`);
  };
  for (const [system, levels] of Object.entries(audit.levels)) levels.forEach((c, i) => finite(c, `levels.${system}[${i}]`));
  audit.misses.forEach((miss, i) => {
    miss.state0.forEach((v, j) => finite(v, `misses[${i}].state0[${j}]`));
    finite(miss.jacobi, `misses[${i}].jacobi`);
    finite(miss.periodNd, `misses[${i}].periodNd`);
  });
  if (Number.isNaN(Date.parse(audit.finishedAt))) throw new Error(`writeAudit: finishedAt must be an ISO 8601 date-time, got ${audit.finishedAt}`);
  return { levels: JSON.stringify(audit.levels), misses: JSON.stringify(audit.misses) };
}

export function prepareAuditStore(db: Database): AuditStore {
  const newest = db.prepare(SELECT_NEWEST);
  const latest = db.prepare(`${SELECT_NEWEST} LIMIT 1`);
  const insert = db.readonly
    ? undefined
    : db.prepare(`INSERT INTO audits (finished_at, seconds, seed, levels_per_system, grid_factor, levels, jobs_audited,
        orbits_checked, miss_count, misses) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`);
  return {
    audits: () => (newest.all() as SqlRecord[]).map(fromRecord),
    latestAudit: () => {
      const record = latest.get() as SqlRecord | undefined;
      return record === undefined ? undefined : fromRecord(record);
    },
    writeAudit(audit) {
      if (insert === undefined) throw new Error('writeAudit: the catalog is open read-only');
      const json = checkedJson(audit);
      const result = insert.run(audit.finishedAt, audit.seconds, audit.seed, audit.levelsPerSystem, audit.gridFactor, json.levels,
        audit.jobsAudited, audit.orbitsChecked, audit.misses.length, json.misses);
      return Number(result.lastInsertRowid);
    },
  };
}
