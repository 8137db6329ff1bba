// The finder's browser-side filter (plain loops over typed columns) selects exactly the rows the same
// query selects in SQLite, in the same order; and its URL state survives a round trip.
import Database from 'better-sqlite3';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readCatalogSnapshot } from '../../site/lib/catalog-source.ts';
import { finderData } from '../../site/lib/finder-data.ts';
import { EMPTY_FILTER, filterRows, type FinderFilter } from '../../site/scripts/finder/finder-filter.ts';
import { queryToState, stateToQuery, type FinderState } from '../../site/scripts/finder/finder-query.ts';
import { sortOrder } from '../../site/scripts/finder/finder-sort.ts';
import { decodeFinderData, type FinderTable } from '../../site/scripts/finder/finder-table.ts';
import { finderSql } from './finder-sql.ts';
import { writeSiteTestCatalog } from './site-test-catalog.ts';

let dir: string;
let db: Database.Database;
let table: FinderTable;
let ids: string[];

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'finder-test-'));
  const path = join(dir, 'catalog.sqlite');
  writeSiteTestCatalog(path, { orbitCount: 300, familyCount: 5 });
  // Through JSON text, as the browser gets it.
  table = decodeFinderData(JSON.parse(JSON.stringify(finderData(readCatalogSnapshot(path)))));
  const orbitIds = table.texts.orbitId!;
  ids = Array.from(orbitIds.codes, (code) => orbitIds.dict[code]!);
  db = new Database(path, { readonly: true });
});
afterAll(() => {
  db?.close();
  rmSync(dir, { recursive: true, force: true });
});

function finderIds(filter: FinderFilter): string[] {
  const hits = new Int32Array(table.n);
  const count = filterRows(table, filter, sortOrder(table, 'orbit', 'asc'), hits);
  return Array.from(hits.subarray(0, count), (i) => ids[i]!);
}

function sqlIds(filter: FinderFilter): string[] {
  const { sql, params } = finderSql(filter);
  return (db.prepare(sql).all(...params) as Array<{ id: string }>).map((r) => r.id);
}

const cases: Array<[string, FinderFilter]> = [
  ['no filter', {}],
  ['system', { sys: 'earth-moon' }],
  ['family', { fam: 'earth-moon/E2M1/a' }],
  ['signature', { sig: 'E3M1' }],
  ['Jacobi range', { cmin: 3.05, cmax: 3.12 }],
  ['period range', { pmin: 25, pmax: 40 }],
  // the period over the system's synodic month (29.530589 d for the Earth–Moon rows, almanac value from memory)
  ['period in synodic months', { smmin: 0.9, smmax: 1.3 }],
  ['stable only', { stable: true }],
  ['|ν| bound', { nu: 0.5 }],
  ['vertical stable', { vert: 'stable' }],
  ['vertical unstable', { vert: 'unstable' }],
  ['altitudes', { a1min: 20_000, a1max: 60_000, a2min: 1_000, a2max: 15_000 }],
  ['has a lock', { lock: 'any' }],
  ['lock 1:1', { lock: '1:1' }],
  ['combined', { sys: 'earth-moon', stable: true, cmin: 3.03, a2max: 20_000, vert: 'stable' }],
  ['unknown family', { fam: 'no/such/family' }],
  ['hold radius at least 300 km', { hmin: 300 }],
  ['hold radius at least 0 km (screened members only)', { hmin: 0 }],
  ['Sun survival at least 0.5', { sunmin: 0.5 }],
  ['eccentricity survival at least 0.6', { eccmin: 0.6 }],
  ['hold radius, both survivals and a family', { fam: 'earth-moon/E2M1/a', hmin: 100, sunmin: 0.25, eccmin: 0.25 }],
];

describe('finder filter against SQLite', () => {
  it.each(cases)('%s', (_label, partial) => {
    const filter = { ...EMPTY_FILTER, ...partial };
    const expected = sqlIds(filter);
    expect(finderIds(filter)).toEqual(expected);
  });

  it('the checks are not vacuous: most cases select some rows but not all', () => {
    const counts = cases.map(([, partial]) => sqlIds({ ...EMPTY_FILTER, ...partial }).length);
    const total = sqlIds(EMPTY_FILTER).length;
    expect(total).toBe(301);
    expect(counts.filter((c) => c > 0 && c < total).length).toBeGreaterThanOrEqual(15);
    // the screening bounds keep some screened members and drop others (SYNTHETIC screenings)
    const screened = sqlIds({ ...EMPTY_FILTER, hmin: 0 }).length;
    for (const partial of [{ hmin: 300 }, { sunmin: 0.5 }, { eccmin: 0.6 }] as FinderFilter[]) {
      const n = sqlIds({ ...EMPTY_FILTER, ...partial }).length;
      expect(n).toBeGreaterThan(0);
      expect(n).toBeLessThan(screened);
    }
    expect(screened).toBeLessThan(sqlIds({ ...EMPTY_FILTER, stable: true }).length);
  });

  it('sorting by hold radius keeps unscreened orbits last in both directions', () => {
    for (const direction of ['asc', 'desc'] as const) {
      const hold = table.numbers.holdRadiusKm!;
      const order = Array.from(sortOrder(table, 'holdRadiusKm', direction));
      const firstUnscreened = order.findIndex((i) => Number.isNaN(hold[i]!));
      expect(firstUnscreened).toBeGreaterThan(0);
      expect(order.slice(firstUnscreened).every((i) => Number.isNaN(hold[i]!))).toBe(true);
      const values = order.slice(0, firstUnscreened).map((i) => hold[i]!);
      expect(values).toEqual([...values].sort((a, b) => (direction === 'asc' ? a - b : b - a)));
    }
  });

  it('carries hold radius and survival fractions exactly as stored', () => {
    const rows = db.prepare(`SELECT o.id, h.hold_radius_km AS hold, sb.surviving_fraction AS sun, se.surviving_fraction AS ecc
      FROM orbits o LEFT JOIN hold_radii h ON h.orbit_id = o.id
      LEFT JOIN model_screenings sb ON sb.orbit_id = o.id AND sb.model = 'bicircular'
      LEFT JOIN model_screenings se ON se.orbit_id = o.id AND se.model = 'elliptic'`).all() as Array<{ id: string; hold: number | null; sun: number | null; ecc: number | null }>;
    const index = new Map(ids.map((id, i) => [id, i]));
    const orNaN = (v: number | null) => (v === null ? NaN : v);
    for (const row of rows) {
      const i = index.get(row.id)!;
      expect(table.numbers.holdRadiusKm![i]).toBe(orNaN(row.hold));
      expect(table.numbers.sunSurvivingFraction![i]).toBe(orNaN(row.sun));
      expect(table.numbers.eccentricitySurvivingFraction![i]).toBe(orNaN(row.ecc));
    }
  });

  it('sorting by a column gives that column in order', () => {
    const order = sortOrder(table, 'jacobi', 'desc');
    const hits = new Int32Array(table.n);
    const count = filterRows(table, EMPTY_FILTER, order, hits);
    const values = Array.from(hits.subarray(0, count), (i) => table.numbers.jacobi![i]!);
    expect(values).toEqual([...values].sort((a, b) => b - a));
  });
  it('sorting by synodic lock keeps orbits without a lock last in both directions', () => {
    for (const direction of ['asc', 'desc'] as const) {
      const lock = table.texts.synodicLock!;
      const order = Array.from(sortOrder(table, 'synodicLock', direction));
      const firstLockless = order.findIndex((i) => lock.codes[i]! < 0);
      expect(firstLockless).toBeGreaterThan(0);
      expect(order.slice(firstLockless).every((i) => lock.codes[i]! < 0)).toBe(true);
      const ratios = order.slice(0, firstLockless).map((i) => {
        const [p, q] = lock.dict[lock.codes[i]!]!.split(':').map(Number); // p:q read as p / q (the lock's meaning)
        return p! / q!;
      });
      expect(ratios).toEqual([...ratios].sort((a, b) => (direction === 'asc' ? a - b : b - a)));
    }
  });
});

describe('finder URL state', () => {
  it('round-trips every field', () => {
    const state: FinderState = {
      filter: {
        sys: 'earth-moon', fam: 'a/b "c" & d', sig: 'E2M1', cmin: 3.01, cmax: 3.2, pmin: 10,
        pmax: 60.5, stable: true, nu: 1e3, vert: 'unstable', a1min: 0, a1max: 1e5,
        a2min: 100, a2max: 2e4, lock: '3:2', hmin: 250.5, sunmin: 0.75,
        eccmin: 0.125,
      },
      sort: 'stabilityIndex',
      direction: 'desc',
      page: 3,
    };
    expect(queryToState(stateToQuery(state))).toEqual(state);
    expect(queryToState('')).toEqual(queryToState(stateToQuery(queryToState(''))));
  });

  it('ignores malformed numbers instead of filtering on NaN', () => {
    const state = queryToState('cmin=abc&cmax=&pmax=12&sort=bogus');
    expect(state.filter.cmin).toBeUndefined();
    expect(state.filter.cmax).toBeUndefined();
    expect(state.filter.pmax).toBe(12);
    expect(state.sort).toBe('orbit');
  });
});
