// Catalog schema version 2: hold radii and model screenings are stored with their family in one
// transaction, read back exactly (SQLite REAL and JSON text keep IEEE doubles exactly: common practice) in
// the order CatalogReader promises, go with their family or orbit on replacement (SQLite foreign keys with
// ON DELETE CASCADE, sqlite.org/foreignkeys.html), are validated like the other rows, are copied by merge,
// and a version-1 file is refused with the one-line message. Vertically critical members (Hénon 1973,
// A&A 28: vertical index ±1 is where a spatial family branches off) are named by the view
// vertical_branch_points.
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { mergeCatalogs } from '../../catalog-db/merge-catalogs.ts';
import { openCatalogForRead, openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import { CATALOG_SCHEMA_VERSION } from '../../catalog-db/schema-version.ts';
import type { CatalogWriter, FamilyBundle } from '../../catalog-db/types.ts';
import { makeBundle, makeRunInput, makeSystem } from '../catalog-db/make-rows.ts';
import { useTempCatalogDir } from '../catalog-db/temp-catalog-path.ts';
import { makeHoldRadius, makeScreening, withScreenings } from './make-screening-rows.ts';

const catalogPath = useTempCatalogDir();
const familyId = 'test-system/B2S1/a';

function newCatalog(name: string): { path: string; writer: CatalogWriter; runId: number } {
  const path = catalogPath(name);
  const writer = openCatalogForWrite(path);
  writer.upsertSystem(makeSystem());
  const runId = writer.startRun(makeRunInput());
  writer.finishRun(runId, '2026-01-03T00:00:00.000Z');
  return { path, writer, runId };
}

function rowCount(path: string, table: string): number {
  const db = new Database(path, { readonly: true });
  try {
    return db.prepare(`SELECT count(*) FROM ${table}`).pluck().get() as number;
  } finally {
    db.close();
  }
}

describe('hold radii and model screenings in the catalog', () => {
  it('read back exactly, ordered by family, orbit seq, then model', () => {
    const { path, writer, runId } = newCatalog('round-trip.sqlite');
    const a = withScreenings(makeBundle(familyId, { runId, orbitCount: 6 }));
    const b = withScreenings(makeBundle('test-system/B1S1/a', { runId, orbitCount: 4, offset: 0.5, signature: 'B1S1' }), 0.5);
    writer.writeFamily(a);
    writer.writeFamily(b);
    writer.close();
    const reader = openCatalogForRead(path);
    const bySeq = (bundle: FamilyBundle) => (id: string) => bundle.orbits.findIndex((o) => o.id === id);
    const holdOrder = (bundle: FamilyBundle) => [...bundle.holdRadii!].sort((p, q) => bySeq(bundle)(p.orbitId) - bySeq(bundle)(q.orbitId));
    const screeningOrder = (bundle: FamilyBundle) => [...bundle.modelScreenings!]
      .sort((p, q) => bySeq(bundle)(p.orbitId) - bySeq(bundle)(q.orbitId) || p.model.localeCompare(q.model));
    expect(reader.holdRadii(familyId)).toEqual(holdOrder(a));
    expect(reader.modelScreenings(familyId)).toEqual(screeningOrder(a));
    // All families: by familyId ('test-system/B1S1/a' < 'test-system/B2S1/a').
    expect(reader.holdRadii()).toEqual([...holdOrder(b), ...holdOrder(a)]);
    expect(reader.modelScreenings()).toEqual([...screeningOrder(b), ...screeningOrder(a)]);
    const empty = reader.holdRadii().find((h) => h.curveX.length === 0)!;
    expect(empty.rotationPerReturnRad).toBeNull();
    expect(reader.modelScreenings().some((m) => m.firstBrokenPeriods.includes(null))).toBe(true);
    expect(reader.holdRadii('no/such/family')).toEqual([]);
    reader.close();
  });

  it('go with the family when it is replaced, and with an orbit that is left out', () => {
    const { path, writer, runId } = newCatalog('cascade.sqlite');
    writer.writeFamily(withScreenings(makeBundle(familyId, { runId, orbitCount: 6 })));
    expect([rowCount(path, 'hold_radii'), rowCount(path, 'model_screenings')]).toEqual([2, 3]);
    // A new version of the family without screenings: none of the old rows may survive.
    writer.writeFamily(makeBundle(familyId, { runId, orbitCount: 6, offset: 1 }));
    expect([rowCount(path, 'hold_radii'), rowCount(path, 'model_screenings')]).toEqual([0, 0]);
    writer.writeFamily(withScreenings(makeBundle(familyId, { runId, orbitCount: 6 })));
    writer.close();
    // Deleting one orbit directly (foreign keys on) removes its rows and only its rows.
    const db = new Database(path);
    db.pragma('foreign_keys = ON');
    db.prepare('DELETE FROM orbits WHERE id = ?').run(`${familyId}/0002`);
    db.close();
    const reader = openCatalogForRead(path);
    expect(reader.holdRadii().map((h) => h.orbitId)).toEqual([`${familyId}/0000`]);
    expect(reader.modelScreenings().map((m) => `${m.orbitId} ${m.model}`)).toEqual([`${familyId}/0001 bicircular`]);
    reader.close();
  });

  it('are validated with the row and field named, and a bad bundle writes nothing', () => {
    const { path, writer, runId } = newCatalog('validate.sqlite');
    const good = withScreenings(makeBundle(familyId, { runId, orbitCount: 6 }));
    writer.writeFamily(good);
    const cases: Array<[string, (b: FamilyBundle) => void, string]> = [
      ['another family', (b) => { b.holdRadii![0]!.familyId = 'other'; }, `hold radius ${familyId}/0002: familyId must be ${familyId}`],
      ['an unknown orbit', (b) => { b.modelScreenings![0]!.orbitId = 'nope'; }, 'model screening nope elliptic: orbitId must be one of the family\'s orbits, got nope'],
      ['a repeated orbit', (b) => { b.holdRadii!.push(makeHoldRadius(b, 2)); }, 'orbitId must appear once among the hold radii'],
      ['a repeated model', (b) => { b.modelScreenings!.push(makeScreening(b, 2, 'elliptic')); }, 'orbitId and model must appear once'],
      ['an unknown model', (b) => { (b.modelScreenings![0] as { model: string }).model = 'n-body'; }, 'model must be bicircular or elliptic, got n-body'],
      ['a short per-phase list', (b) => { b.modelScreenings![1]!.maxDepartureKm.pop(); }, 'maxDepartureKm must list one value per phase (8), got 7'],
      ['a fraction the phases contradict', (b) => { b.modelScreenings![1]!.survivingFraction = 0.5; }, 'survivingFraction must be 0.375'],
      ['a negative radius', (b) => { b.holdRadii![0]!.holdRadiusKm = -1; }, 'holdRadiusKm must be ≥ 0, got -1'],
      ['curves of two lengths', (b) => { b.holdRadii![0]!.curveVx.pop(); }, 'curveX and curveVx must be arrays of the same length'],
      ['NaN in a curve', (b) => { b.holdRadii![0]!.curveX[3] = Number.NaN; }, `hold radius ${familyId}/0002: curveX must be an array of finite numbers`],
      ['a fractional broken period', (b) => { b.modelScreenings![2]!.firstBrokenPeriods[0] = 1.5; }, 'firstBrokenPeriods must be an array of integers or nulls'],
      ['Infinity in the parameters', (b) => { b.modelScreenings![0]!.parameters.eccentricity = Infinity; }, 'parameters must be an object of finite numbers'],
    ];
    for (const [what, edit, message] of cases) {
      const broken = withScreenings(makeBundle(familyId, { runId, orbitCount: 6, offset: 3 }), 3);
      edit(broken);
      expect(() => writer.writeFamily(broken), what).toThrow(message);
    }
    writer.close();
    const reader = openCatalogForRead(path);
    expect(reader.orbits(familyId)).toEqual(good.orbits); // the first version is intact
    expect(reader.holdRadii()).toHaveLength(2);
    expect(reader.modelScreenings()).toHaveLength(3);
    reader.close();
  });

  it('are copied by merge, with the family that wins', () => {
    const shard = (name: string, offset: number, finishedAt: string) => {
      const path = catalogPath(name);
      const writer = openCatalogForWrite(path);
      writer.upsertSystem(makeSystem());
      const runId = writer.startRun(makeRunInput({ shard: name === 'older.sqlite' ? '1/2' : '2/2' }));
      writer.writeFamily(withScreenings(makeBundle(familyId, { runId, orbitCount: 5, offset }), offset));
      writer.finishRun(runId, finishedAt);
      writer.close();
      return path;
    };
    const older = shard('older.sqlite', 0, '2026-01-02T00:00:00.000Z');
    const newer = shard('newer.sqlite', 2, '2026-01-05T00:00:00.000Z');
    const out = catalogPath('merged.sqlite');
    mergeCatalogs(out, [older, newer]);
    const reader = openCatalogForRead(out);
    const fromNewer = openCatalogForRead(newer);
    expect(reader.holdRadii()).toEqual(fromNewer.holdRadii());
    expect(reader.modelScreenings()).toEqual(fromNewer.modelScreenings());
    expect(reader.holdRadii()[1]!.holdRadiusKm).toBeCloseTo(125.5, 9); // orbit 0002: 123.4 + 2 + 0.1, the newer copy
    fromNewer.close();
    reader.close();
  });

  it('a version-1 catalog is refused with the one-line message, for reading and writing', () => {
    expect(CATALOG_SCHEMA_VERSION).toBe(4);
    const path = catalogPath('v1.sqlite');
    newCatalog('v1.sqlite').writer.close();
    const raw = new Database(path);
    raw.pragma('user_version = 1');
    raw.close();
    const expected = `catalog ${path} has schema version 1, this cycler-atlas needs 4 (regenerate it or use a matching version)`;
    expect(() => openCatalogForRead(path)).toThrow(expected);
    expect(() => openCatalogForWrite(path)).toThrow(expected);
  });

  it('names the vertically critical members in the view vertical_branch_points', () => {
    const { path, writer, runId } = newCatalog('branch.sqlite');
    const bundle = makeBundle(familyId, { runId, orbitCount: 6 });
    // Put the two bifurcations on stored members, as the generator does (same arclength).
    bundle.bifurcations[0]!.arclength = bundle.orbits[1]!.arclength; // in-plane: not a spatial branch
    bundle.bifurcations[1]!.arclength = bundle.orbits[4]!.arclength; // vertical, period doubling
    writer.writeFamily(bundle);
    writer.close();
    const db = new Database(path, { readonly: true });
    const rows = db.prepare('SELECT * FROM vertical_branch_points').all();
    db.close();
    expect(rows).toEqual([{
      bifurcation_id: `${familyId}/b1`,
      family_id: familyId,
      orbit_id: `${familyId}/0004`,
      kind: 'period-doubling',
      vertical_index: -1,
      jacobi: 3.01,
      period_days: 13.75,
      secondary_min_alt_km: 5e-324,
      state0: JSON.stringify([1.1, 0, 1e-300, 0, -0.4, 0.25]),
    }]);
  });
});
