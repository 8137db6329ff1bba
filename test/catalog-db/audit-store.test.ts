// The audits table (schema version 3): a finished audit is stored and read back as written, newest
// first (also through the catalog reader, and in the home page's one-line summary), and values SQLite or
// JSON cannot keep are refused with the field named (common practice).
import { describe, expect, it } from 'vitest';
import { prepareAuditStore } from '../../catalog-db/audit-store.ts';
import type { AuditRow } from '../../catalog-db/audit-types.ts';
import { auditSummary, readLatestAudit } from '../../catalog-db/latest-audit.ts';
import { openCatalogForRead, openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import { openSqliteForRead, openSqliteForWrite } from '../../catalog-db/open-sqlite.ts';
import { useTempCatalogDir } from './temp-catalog-path.ts';

const catalogPath = useTempCatalogDir();

function audit(finishedAt: string, misses: AuditRow['misses'] = []): Omit<AuditRow, 'id'> {
  return {
    finishedAt, seconds: 12.5, seed: 4242, levelsPerSystem: 2, gridFactor: 4,
    levels: { 'earth-moon': [3.1234567890123, 3.15], 'pluto-charon': [3.6, 3.7] },
    jobsAudited: 3, orbitsChecked: 17, misses,
  };
}

const miss: AuditRow['misses'][number] = {
  jobKey: 'earth-moon:E1M1', systemId: 'earth-moon', signature: 'E1M1', segment: 'between', direction: -1,
  halfCrossings: 3, jacobi: 3.1, periodNd: 12.25, state0: [0.1, 0, 0, 0, -2.5, 0], xHalf: -0.4,
};

describe('audits table', () => {
  it('reads audits back as written, newest first', () => {
    const path = catalogPath('audits.sqlite');
    const writer = openCatalogForWrite(path);
    const first = writer.writeAudit(audit('2026-01-01T00:00:00.000Z'));
    const second = writer.writeAudit(audit('2026-01-02T00:00:00.000Z', [miss]));
    writer.close();
    const read = prepareAuditStore(openSqliteForRead(path));
    expect(read.audits().map((a) => a.id)).toEqual([second, first]);
    expect(read.latestAudit()).toEqual({ id: second, ...audit('2026-01-02T00:00:00.000Z', [miss]) });
    expect(() => read.writeAudit(audit('2026-01-03T00:00:00.000Z'))).toThrow('writeAudit: the catalog is open read-only');
    const reader = openCatalogForRead(path);
    expect(reader.audits().map((a) => a.id)).toEqual([second, first]);
    expect(reader.latestAudit()?.misses).toEqual([miss]);
    reader.close();
    // The summary counts the levels of every system (2 + 2) and says how many orbits are missing.
    expect(auditSummary(readLatestAudit(path))).toBe(
      'Completeness audit of 2026-01-02: 17 symmetric orbits found afresh at 4 random Jacobi levels (seed 4242) for 3 lap signatures; 1 lies on no catalogued family.',
    );
    expect(auditSummary(readLatestAudit(path), '2026-01-03T00:00:00.000Z')).toMatch(/family \(the catalog has been generated further since\)\.$/);
    expect(auditSummary(readLatestAudit(path), '2026-01-01T00:00:00.000Z')).toMatch(/family\.$/);
  });

  it('gives undefined for a catalog never audited', () => {
    const db = openSqliteForWrite(catalogPath('empty.sqlite'));
    expect(prepareAuditStore(db).latestAudit()).toBeUndefined();
    db.close();
    expect(auditSummary(readLatestAudit(catalogPath('empty.sqlite')))).toBe('Completeness audit: not run on this catalog yet (cycler-atlas audit).');
  });

  it('refuses a NaN in a miss and a bad date, naming the field, and writes nothing', () => {
    const db = openSqliteForWrite(catalogPath('bad.sqlite'));
    const store = prepareAuditStore(db);
    expect(() => store.writeAudit(audit('2026-01-01T00:00:00Z', [{ ...miss, state0: [0.1, 0, 0, 0, Number.NaN, 0] }])))
      .toThrow('writeAudit: misses[0].state0[4] must be a finite number, got NaN');
    expect(() => store.writeAudit(audit('yesterday'))).toThrow('writeAudit: finishedAt must be an ISO 8601 date-time, got yesterday');
    expect(store.audits()).toEqual([]);
    db.close();
  });
});
