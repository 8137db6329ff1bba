// Reads what two catalogs must agree on (families, their orbits' states and periods, windows,
// bifurcations, finished jobs) so that tests can compare runs done in different ways.
import Database from 'better-sqlite3';
import { expect } from 'vitest';
import { openCatalogForRead } from '../../catalog-db/open-catalog.ts';

export interface CatalogSnapshot {
  families: Array<{ id: string; memberCount: number; windows: number; bifurcations: number }>;
  orbits: Map<string, { state0: number[]; period: number; jacobi: number }>;
  jobsDone: string[];
}

export function snapshotCatalog(path: string): CatalogSnapshot {
  const reader = openCatalogForRead(path);
  try {
    const families = reader.families().map((f) => ({
      id: f.id,
      memberCount: f.memberCount,
      windows: reader.stableWindows(f.id).length,
      bifurcations: reader.bifurcations(f.id).length,
    }));
    const orbits = new Map(reader.orbits().map((o) => [o.id, { state0: o.state0, period: o.period, jacobi: o.jacobi }]));
    return { families, orbits, jobsDone: jobsDone(path) };
  } finally {
    reader.close();
  }
}

/** Keys of the jobs marked done (the reader does not expose them; read the table directly). */
export function jobsDone(path: string): string[] {
  const db = new Database(path, { readonly: true, fileMustExist: true });
  try {
    return (db.prepare('SELECT job_key FROM jobs ORDER BY job_key').pluck().all() as string[]);
  } finally {
    db.close();
  }
}

/** Same families and orbit ids; states, periods and Jacobi constants equal to 1e-12. */
export function expectSameCatalog(actual: CatalogSnapshot, expected: CatalogSnapshot): void {
  expect(actual.families).toEqual(expected.families);
  expect([...actual.orbits.keys()]).toEqual([...expected.orbits.keys()]);
  expect(actual.jobsDone).toEqual(expected.jobsDone);
  let worst = 0;
  for (const [id, want] of expected.orbits) {
    const got = actual.orbits.get(id)!;
    for (let i = 0; i < 6; i++) worst = Math.max(worst, Math.abs(got.state0[i]! - want.state0[i]!));
    worst = Math.max(worst, Math.abs(got.period - want.period), Math.abs(got.jacobi - want.jacobi));
  }
  expect(worst).toBeLessThanOrEqual(1e-12);
}
