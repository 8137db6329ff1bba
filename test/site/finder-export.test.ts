// The finder's bulk exports (CSV and JSON of the filtered set) carry each orbit's full start state,
// nondimensional and in km, km/s, its period in TU and days, and a metadata header (system, μ, LU, TU,
// frame, catalog run, tolerances): every number checked against the catalog file through SQLite, the km
// values converted there (SQL arithmetic, an independent path from the site's conversion).
import Database from 'better-sqlite3';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readCatalogSnapshot } from '../../site/lib/catalog-source.ts';
import { finderData } from '../../site/lib/finder-data.ts';
import { rowsToCsv, rowsToJson } from '../../site/scripts/finder/finder-export.ts';
import { filterRows } from '../../site/scripts/finder/finder-filter.ts';
import { sortOrder } from '../../site/scripts/finder/finder-sort.ts';
import { decodeFinderData, type FinderTable } from '../../site/scripts/finder/finder-table.ts';
import { parseCsvRecords } from './parse-csv.ts';
import { writeSiteTestCatalog } from './site-test-catalog.ts';

let dir: string;
let db: Database.Database;
let table: FinderTable;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'finder-export-test-'));
  const path = join(dir, 'catalog.sqlite');
  writeSiteTestCatalog(path, { orbitCount: 40, familyCount: 2 });
  table = decodeFinderData(JSON.parse(JSON.stringify(finderData(readCatalogSnapshot(path))))); // as the browser gets it
  db = new Database(path, { readonly: true });
});
afterAll(() => {
  db?.close();
  rmSync(dir, { recursive: true, force: true });
});

const STATE_KEYS = ['x0', 'y0', 'z0', 'vx0', 'vy0', 'vz0'];
const KM_KEYS = ['xKm', 'yKm', 'zKm', 'vxKmS', 'vyKmS', 'vzKmS'];

interface StoredRow {
  id: string; state0: string; period: number; period_days: number; system_id: string; mu: number; lu: number; tu: number;
  run_id: number; rtol: number; atol: number; generator_version: string;
  x_km: number; y_km: number; z_km: number; vx_km_s: number; vy_km_s: number; vz_km_s: number;
}
function stored(id: string): StoredRow {
  return db.prepare(`SELECT o.id, o.state0, o.period, o.period_days, s.id AS system_id, s.mu, s.length_unit_km AS lu, s.time_unit_s AS tu,
      r.id AS run_id, r.rtol, r.atol, r.generator_version,
      json_extract(o.state0, '$[0]') * s.length_unit_km AS x_km, json_extract(o.state0, '$[1]') * s.length_unit_km AS y_km,
      json_extract(o.state0, '$[2]') * s.length_unit_km AS z_km, json_extract(o.state0, '$[3]') * (s.length_unit_km / s.time_unit_s) AS vx_km_s,
      json_extract(o.state0, '$[4]') * (s.length_unit_km / s.time_unit_s) AS vy_km_s, json_extract(o.state0, '$[5]') * (s.length_unit_km / s.time_unit_s) AS vz_km_s
    FROM orbits o JOIN families f ON f.id = o.family_id JOIN systems s ON s.id = f.system_id JOIN runs r ON r.id = f.run_id WHERE o.id = ?`).get(id) as StoredRow;
}

function selection(filter: Record<string, string | number | boolean>) {
  const hits = new Int32Array(table.n);
  const count = filterRows(table, filter, sortOrder(table, 'orbit', 'asc'), hits);
  return { hits, count };
}

describe('finder bulk exports', () => {
  it('CSV: metadata comment lines, then the header and rows with the start state in both units and the period in TU and days', () => {
    const { hits, count } = selection({}); // every orbit: both systems (synthetic Earth–Moon and the HNW test system)
    const csv = rowsToCsv(table, hits, count, '');
    const lines = csv.split('\r\n').filter((line) => line !== '');
    const comments = lines.filter((line) => line.startsWith('# '));
    expect(lines.slice(0, comments.length)).toEqual(comments); // the comments come first
    const [columns, ...records] = parseCsvRecords(csv.split('\r\n').slice(comments.length).join('\r\n'));
    expect(records.length).toBe(count);
    for (const key of [...STATE_KEYS, ...KM_KEYS, 'period', 'periodDays', 'orbitId', 'systemId', 'runId']) expect(columns, key).toContain(key);
    const systems = db.prepare('SELECT id, mu, length_unit_km AS lu, time_unit_s AS tu FROM systems ORDER BY id').all() as Array<{ id: string; mu: number; lu: number; tu: number }>;
    expect(systems.length).toBe(2);
    for (const s of systems) {
      const line = comments.find((c) => c.startsWith(`# system ${s.id} `));
      expect(line, s.id).toBeDefined();
      expect(line).toContain(`mu = ${s.mu};`);
      expect(line).toContain(`LU = ${s.lu} km;`);
      expect(line).toContain(`TU = ${s.tu} s`);
    }
    const runs = db.prepare('SELECT id, rtol, atol FROM runs').all() as Array<{ id: number; rtol: number; atol: number }>;
    for (const r of runs) expect(comments.find((c) => c.startsWith(`# catalog run ${r.id}:`))).toContain(`rtol = ${r.rtol}, atol = ${r.atol}`);
    expect(comments.some((c) => c.startsWith('# frame: CR3BP rotating frame'))).toBe(true);
    expect(comments.find((c) => c.startsWith('# units:'))).toContain('period TU, periodDays d');

    const col = (name: string) => columns!.indexOf(name);
    for (const cells of records) {
      const row = stored(cells[col('orbitId')]!);
      expect(STATE_KEYS.map((k) => Number(cells[col(k)]))).toEqual(JSON.parse(row.state0));
      expect(KM_KEYS.map((k) => Number(cells[col(k)]))).toEqual([row.x_km, row.y_km, row.z_km, row.vx_km_s, row.vy_km_s, row.vz_km_s]);
      expect(Number(cells[col('period')])).toBe(row.period);
      expect(Number(cells[col('periodDays')])).toBe(row.period_days);
      expect(Number(cells[col('runId')])).toBe(row.run_id);
    }
  });

  it('JSON: the same metadata as fields, only the systems and runs of the exported rows', () => {
    const { hits, count } = selection({ sys: 'earth-moon', stable: true });
    expect(count).toBeGreaterThan(2);
    const json = JSON.parse(rowsToJson(table, hits, count, 'sys=earth-moon&stable=1'));
    expect(json.query).toBe('sys=earth-moon&stable=1');
    expect(json.count).toBe(count);
    expect(json.frame).toMatch(/^CR3BP rotating frame/);
    const first = stored(json.orbits[0].orbitId);
    expect(json.systems).toEqual([expect.objectContaining({ id: 'earth-moon', mu: first.mu, lengthUnitKm: first.lu, timeUnitS: first.tu, timeUnitDays: first.tu / 86400 })]);
    expect(json.runs).toEqual([expect.objectContaining({ id: first.run_id, rtol: first.rtol, atol: first.atol, generatorVersion: first.generator_version })]);
    expect(json.units).toMatchObject({ period: 'TU', periodDays: 'd', xKm: 'km', vxKmS: 'km/s', x0: 'LU', vx0: 'LU/TU' });
    expect(json.orbits.length).toBe(count);
    for (const orbit of json.orbits) {
      const row = stored(orbit.orbitId);
      expect(STATE_KEYS.map((k) => orbit[k])).toEqual(JSON.parse(row.state0));
      expect(KM_KEYS.map((k) => orbit[k])).toEqual([row.x_km, row.y_km, row.z_km, row.vx_km_s, row.vy_km_s, row.vz_km_s]);
      expect([orbit.period, orbit.periodDays]).toEqual([row.period, row.period_days]);
    }
  });
});
