// What an orbit page shows equals what the database holds: every orbit of a test catalog, compared with
// rows read straight from SQLite (better-sqlite3, not catalog-db's reader), units converted in SQL.
import Database from 'better-sqlite3';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readCatalogSnapshot, type CatalogSnapshot } from '../../site/lib/catalog-source.ts';
import { initialStateFile } from '../../site/lib/initial-state-file.ts';
import { orbitPageData } from '../../site/lib/orbit-page-data.ts';
import { orbitHref } from '../../site/lib/page-links.ts';
import { HOSTILE_TEXT, writeSiteTestCatalog } from './site-test-catalog.ts';

interface SqlOrbit {
  id: string; family_id: string; seq: number; state0: string; jacobi: number; period: number; period_days: number;
  stability_index: number; vertical_stability_index: number; eigenvalues: string; primary_min_alt_km: number;
  secondary_min_alt_km: number; synodic_p: number | null; synodic_q: number | null; synodic_rel_error: number | null;
  closure_error: number; jacobi_drift: number; stable: number; family_name: string; system_name: string;
  x_km: number; y_km: number; z_km: number; vx_km_s: number; vy_km_s: number; vz_km_s: number; period_s: number;
  prev_id: string | null; next_id: string | null; rank: number; members: number;
}

let dir: string;
let db: Database.Database;
let catalog: CatalogSnapshot;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'orbit-page-test-'));
  const path = join(dir, 'catalog.sqlite');
  writeSiteTestCatalog(path, { orbitCount: 60, familyCount: 3 });
  catalog = readCatalogSnapshot(path);
  db = new Database(path, { readonly: true });
});
afterAll(() => {
  db?.close();
  rmSync(dir, { recursive: true, force: true });
});

const ORBITS_SQL = `
  SELECT o.*, f.name AS family_name, s.name AS system_name,
    json_extract(o.state0, '$[0]') * s.length_unit_km AS x_km,
    json_extract(o.state0, '$[1]') * s.length_unit_km AS y_km,
    json_extract(o.state0, '$[2]') * s.length_unit_km AS z_km,
    json_extract(o.state0, '$[3]') * s.length_unit_km / s.time_unit_s AS vx_km_s,
    json_extract(o.state0, '$[4]') * s.length_unit_km / s.time_unit_s AS vy_km_s,
    json_extract(o.state0, '$[5]') * s.length_unit_km / s.time_unit_s AS vz_km_s,
    o.period * s.time_unit_s AS period_s,
    (SELECT p.id FROM orbits p WHERE p.family_id = o.family_id AND p.seq < o.seq ORDER BY p.seq DESC LIMIT 1) AS prev_id,
    (SELECT n.id FROM orbits n WHERE n.family_id = o.family_id AND n.seq > o.seq ORDER BY n.seq LIMIT 1) AS next_id,
    (SELECT count(*) FROM orbits r WHERE r.family_id = o.family_id AND r.seq <= o.seq) AS rank,
    (SELECT count(*) FROM orbits m WHERE m.family_id = o.family_id) AS members
  FROM orbits o JOIN families f ON f.id = o.family_id JOIN systems s ON s.id = f.system_id
  ORDER BY o.family_id, o.seq`;

describe('orbit page data', () => {
  it('equals the database row for every orbit', () => {
    const rows = db.prepare(ORBITS_SQL).all() as SqlOrbit[];
    expect(rows.length).toBe(61);
    for (const row of rows) {
      const page = orbitPageData(catalog, row.id);
      expect(page.orbit.id).toBe(row.id);
      expect(page.family.name).toBe(row.family_name);
      expect(page.system.name).toBe(row.system_name);
      expect(page.state0Nd).toEqual(JSON.parse(row.state0));
      expect(page.periodNd).toBe(row.period);
      expect(page.periodDays).toBe(row.period_days);
      expect(page.periodS).toBeCloseTo(row.period_s, 6);
      expect(page.orbit.jacobi).toBe(row.jacobi);
      expect(page.orbit.stabilityIndex).toBe(row.stability_index);
      expect(page.orbit.verticalStabilityIndex).toBe(row.vertical_stability_index);
      expect(page.orbit.eigenvalues).toEqual(JSON.parse(row.eigenvalues));
      expect(page.orbit.primaryMinAltKm).toBe(row.primary_min_alt_km);
      expect(page.orbit.secondaryMinAltKm).toBe(row.secondary_min_alt_km);
      expect(page.orbit.closureError).toBe(row.closure_error);
      expect(page.orbit.jacobiDrift).toBe(row.jacobi_drift);
      expect(page.orbit.stable).toBe(row.stable === 1);
      expect(page.synodicLock).toEqual(
        row.synodic_p === null ? null : { p: row.synodic_p, q: row.synodic_q, relError: row.synodic_rel_error },
      );
      const km = [...page.state0Km.positionKm, ...page.state0Km.velocityKmS];
      const sqlKm = [row.x_km, row.y_km, row.z_km, row.vx_km_s, row.vy_km_s, row.vz_km_s];
      km.forEach((v, i) => expect(v).toBeCloseTo(sqlKm[i], 9));
      expect(page.previous?.href ?? null).toBe(row.prev_id === null ? null : orbitHref(row.prev_id));
      expect(page.next?.href ?? null).toBe(row.next_id === null ? null : orbitHref(row.next_id));
      expect(page.rank).toBe(row.rank);
      expect(page.memberCount).toBe(row.members);
      const file = initialStateFile(page);
      expect([file.state0Nd.x, file.state0Nd.y, file.state0Nd.z, file.state0Nd.vx, file.state0Nd.vy, file.state0Nd.vz]).toEqual(JSON.parse(row.state0));
    }
  });

  it('keeps names with markup as plain text (escaping is left to the page)', () => {
    const arenstorf = catalog.orbits.find((o) => catalog.familyById.get(o.familyId)?.name === HOSTILE_TEXT);
    expect(arenstorf).toBeDefined();
    expect(orbitPageData(catalog, arenstorf!.id).family.name).toBe(HOSTILE_TEXT);
  });

  it('fails with a one-line error for an unknown orbit', () => {
    expect(() => orbitPageData(catalog, 'no/such/orbit')).toThrow(/orbit "no\/such\/orbit" is not in the catalog/);
  });
});
