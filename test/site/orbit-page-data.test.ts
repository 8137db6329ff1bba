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

  it('shows the hold radius and screenings the database holds, converted in SQL, and nothing for unscreened members', () => {
    // Rows straight from SQLite; km and m/s conversions of the section points done in SQL (json_each).
    const holds = db.prepare(`SELECT h.*, s.length_unit_km AS lu, s.time_unit_s AS tu, json_extract(o.state0, '$[0]') * s.length_unit_km AS fx_km,
        json_extract(o.state0, '$[3]') * s.length_unit_km / s.time_unit_s * 1000 AS fvx_ms
      FROM hold_radii h JOIN orbits o ON o.id = h.orbit_id JOIN families f ON f.id = o.family_id JOIN systems s ON s.id = f.system_id`).all() as Array<Record<string, number | string | null>>;
    const points = db.prepare(`SELECT x.value * s.length_unit_km AS x_km, v.value * s.length_unit_km / s.time_unit_s * 1000 AS vx_ms
      FROM hold_radii h JOIN orbits o ON o.id = h.orbit_id JOIN families f ON f.id = o.family_id JOIN systems s ON s.id = f.system_id,
        json_each(h.curve_x) x JOIN json_each(h.curve_vx) v ON v.key = x.key
      WHERE h.orbit_id = ? ORDER BY x.key`);
    const screenings = db.prepare(`SELECT * FROM model_screenings ORDER BY orbit_id, model`).all() as Array<Record<string, number | string>>;
    expect(holds.length).toBeGreaterThan(5);
    expect(screenings.length).toBeGreaterThan(holds.length);
    for (const row of holds) {
      const page = orbitPageData(catalog, String(row.orbit_id));
      expect(page.orbit.stable).toBe(true); // only stable members are screened
      const h = page.screenings?.holdRadius;
      expect(h?.holdRadiusKm).toBe(row.hold_radius_km);
      expect(h?.holdRadiusNd).toBe(row.hold_radius_nd);
      expect(h?.failingDisplacementKm).toBe(row.failing_displacement_km);
      expect(h?.returns).toBe(row.returns);
      expect(h?.rotationPerReturnRad).toBe(row.rotation_per_return_rad);
      expect(h?.curveX).toEqual(JSON.parse(String(row.curve_x)));
      const view = page.screening.holdRadius!;
      expect(view.holdRadiusKm).toBe(row.hold_radius_km);
      expect(view.fixedPoint.xKm).toBeCloseTo(Number(row.fx_km), 9);
      expect(view.fixedPoint.vxMS).toBeCloseTo(Number(row.fvx_ms), 9);
      const sqlPoints = points.all(row.orbit_id) as Array<{ x_km: number; vx_ms: number }>;
      expect(view.points.length).toBe(sqlPoints.length);
      view.points.forEach((p, i) => {
        expect(p.xKm).toBeCloseTo(sqlPoints[i].x_km, 9);
        expect(p.vxMS).toBeCloseTo(sqlPoints[i].vx_ms, 9);
      });
    }
    for (const row of screenings) {
      const page = orbitPageData(catalog, String(row.orbit_id));
      const model = row.model as 'bicircular' | 'elliptic';
      const stored = page.screenings?.[model];
      expect(stored?.survivingFraction).toBe(row.surviving_fraction);
      expect(stored?.spanNd).toBe(row.span_nd);
      expect(stored?.firstBrokenPeriods).toEqual(JSON.parse(String(row.first_broken_periods)));
      expect(stored?.parameters).toEqual(JSON.parse(String(row.parameters)));
      const view = page.screening.models.find((m) => m.model === model)!;
      expect(view.survivingFraction).toBe(row.surviving_fraction);
      expect(view.phaseCount).toBe(row.phases);
      const phases = JSON.parse(String(row.phase_rad)) as number[];
      const broken = JSON.parse(String(row.first_broken_periods)) as Array<number | null>;
      const departures = JSON.parse(String(row.max_departure_km)) as number[];
      expect(view.rows.map((r) => r.phaseDeg)).toEqual(phases.map((p) => (p * 180) / Math.PI));
      expect(view.rows.map((r) => r.firstBrokenPeriod)).toEqual(broken);
      // the row stores 0 for a phase whose first period broke (no period held); the page says so instead
      expect(view.rows.map((r) => r.maxDepartureKm)).toEqual(departures.map((d, i) => (broken[i] === 1 ? null : d)));
      expect(view.survivingPhases / view.phaseCount).toBe(row.surviving_fraction);
    }
    // screened in the models without a hold radius (the generator computes it for a few members per window)
    const withoutHold = screenings.filter((m) => !holds.some((h) => h.orbit_id === m.orbit_id));
    expect(withoutHold.length).toBeGreaterThan(0);
    for (const m of withoutHold) {
      const page = orbitPageData(catalog, String(m.orbit_id));
      expect(page.screening.screened).toBe(true);
      expect(page.screening.holdRadius).toBeNull();
    }
    // every other orbit: no rows in the database and "not screened" on the page
    const screenedIds = new Set([...holds.map((h) => h.orbit_id), ...screenings.map((m) => m.orbit_id)]);
    const unscreened = (db.prepare('SELECT id, stable FROM orbits').all() as Array<{ id: string; stable: number }>).filter((o) => !screenedIds.has(o.id));
    expect(unscreened.some((o) => o.stable === 1)).toBe(true); // a stable member the run left unscreened
    for (const o of unscreened) {
      const page = orbitPageData(catalog, o.id);
      expect(page.screenings).toBeNull();
      expect(page.screening).toEqual({ screened: false, holdRadius: null, models: [] });
    }
  });

  it('fails with a one-line error for an unknown orbit', () => {
    expect(() => orbitPageData(catalog, 'no/such/orbit')).toThrow(/orbit "no\/such\/orbit" is not in the catalog/);
  });
});
