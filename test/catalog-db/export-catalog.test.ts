// JSON and CSV exports. The JSON is checked against catalog-db/catalog-export.schema.json (JSON Schema
// draft 2020-12) with zod 4's z.fromJSONSchema, an independent validator of the schema file; the CSV is
// read back with vega's CSV reader (d3-dsv, an independent RFC 4180 parser).
import { readFileSync } from 'node:fs';
import { read as readTable } from 'vega';
import { beforeAll, describe, expect, it } from 'vitest';
import { z } from 'zod';
import { exportCatalogCsv, exportCatalogJson } from '../../catalog-db/export-catalog.ts';
import { openCatalogForRead, openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import type { CatalogReader, FamilyBundle } from '../../catalog-db/types.ts';
import { makeBundle, makeRunInput, makeScenario, makeSystem } from './make-rows.ts';
import { useTempCatalogDir } from './temp-catalog-path.ts';

const catalogPath = useTempCatalogDir();
const schemaJson = JSON.parse(readFileSync(new URL('../../catalog-db/catalog-export.schema.json', import.meta.url), 'utf8'));
const exportSchema = z.fromJSONSchema(schemaJson);

// The public contract of the JSON export (names agreed for cycler-atlas downloads; listed here on
// their own so that a rename in the code or the schema fails this test).
const contract = {
  top: ['formatVersion', 'generatedAt', 'scenario', 'runs', 'systems', 'families'],
  system: ['id', 'name', 'mu', 'lengthUnitKm', 'timeUnitS', 'primaryRadiusKm', 'secondaryRadiusKm'],
  family: ['id', 'systemId', 'signature', 'primaryLaps', 'secondaryLaps', 'endReasons', 'kind', 'name', 'orbits', 'stableWindows', 'bifurcations'],
  orbit: ['id', 'state0', 'jacobi', 'period', 'periodDays', 'stabilityIndex', 'verticalStabilityIndex', 'secondaryMinAltKm', 'primaryMinAltKm', 'primaryMinRadiusKm', 'closureError', 'stable'],
  stableWindow: ['fromJacobi', 'toJacobi', 'fromSecondaryMinAltKm', 'toSecondaryMinAltKm', 'widthKm', 'midPeriodDays', 'midOrbitId'],
};

let reader: CatalogReader;
let bundles: FamilyBundle[];
let runIds: number[];

beforeAll(() => {
  const path = catalogPath('export.sqlite');
  const writer = openCatalogForWrite(path);
  writer.upsertSystem(makeSystem());
  writer.upsertSystem(makeSystem({ id: 'second-system', synodicPeriodDays: 29.530589 }));
  writer.setScenario(makeScenario());
  runIds = [writer.startRun(makeRunInput()), writer.startRun(makeRunInput({ shard: '2/2' }))];
  writer.finishRun(runIds[0]!, '2026-01-03T00:00:00.000Z');
  bundles = [
    makeBundle('test-system/B2S1/a', { runId: runIds[0]!, orbitCount: 7 }),
    makeBundle('second-system/B1S1/a', { runId: runIds[1]!, systemId: 'second-system', orbitCount: 4, offset: 0.3, signature: 'B1S1' }),
  ];
  for (const bundle of bundles) writer.writeFamily(bundle);
  writer.close();
  reader = openCatalogForRead(path);
  return () => reader.close();
});

function issues(value: unknown): string[] {
  const result = exportSchema.safeParse(value);
  return result.success ? [] : result.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
}

describe('exportCatalogJson', () => {
  it('validates against the JSON Schema', () => {
    const exported = exportCatalogJson(reader);
    expect(issues(exported)).toEqual([]);
    expect(issues(JSON.parse(JSON.stringify(exported)))).toEqual([]); // as a downloaded file
  });

  it('the schema check is not vacuous: broken exports fail it', () => {
    const exported = exportCatalogJson(reader);
    const broken = (edit: (copy: any) => void) => {
      const copy = structuredClone(exported);
      edit(copy);
      return issues(copy);
    };
    expect(broken((c) => delete c.families[0].orbits[2].state0)).not.toEqual([]);
    expect(broken((c) => c.families[0].orbits[0].state0.pop())).not.toEqual([]);
    expect(broken((c) => (c.families[1].endReasons = 'max-members'))).not.toEqual([]);
    expect(broken((c) => (c.systems[0].mu = '0.3'))).not.toEqual([]);
    expect(broken((c) => delete c.families[0].stableWindows[0].widthKm)).not.toEqual([]);
    expect(broken((c) => (c.families[0].kind = 'spiral'))).not.toEqual([]);
    expect(broken((c) => delete c.generatedAt)).not.toEqual([]);
    expect(broken((c) => (c.families[0].orbits[0].extraField = 1))).toEqual([]); // more properties are allowed
  });

  it('uses the contract names, and the schema requires every one of them', () => {
    const exported = exportCatalogJson(reader) as unknown as Record<string, any>;
    expect(Object.keys(exported)).toEqual(expect.arrayContaining(contract.top));
    expect(Object.keys(exported.systems[0])).toEqual(expect.arrayContaining(contract.system));
    const family = exported.families.find((f: any) => f.id === 'test-system/B2S1/a');
    expect(Object.keys(family)).toEqual(expect.arrayContaining(contract.family));
    expect(family.endReasons).toEqual({ start: 'step-too-small', end: 'max-members' });
    expect(Object.keys(family.orbits[0])).toEqual(expect.arrayContaining(contract.orbit));
    expect(Object.keys(family.stableWindows[0])).toEqual(expect.arrayContaining(contract.stableWindow));
    expect(schemaJson.required).toEqual(expect.arrayContaining(contract.top));
    for (const def of ['system', 'family', 'orbit', 'stableWindow'] as const) {
      expect(schemaJson.$defs[def].required, def).toEqual(expect.arrayContaining(contract[def]));
    }
    expect(schemaJson.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
  });

  it('describes the optional per-orbit screening objects (checked with data in test/beyond-integration/export-screenings.test.ts)', () => {
    for (const key of ['holdRadius', 'screenings', 'verticalBranchPoint']) expect(schemaJson.$defs.orbit.properties).toHaveProperty(key);
    expect(schemaJson.$defs.orbit.required).not.toContain('holdRadius');
  });

  it('carries the stored rows unchanged, families in catalog order', () => {
    const exported = exportCatalogJson(reader, { generatedAt: '2026-04-01T00:00:00.000Z' });
    expect(exported.generatedAt).toBe('2026-04-01T00:00:00.000Z');
    expect(exported.scenario).toEqual(makeScenario());
    expect(exported.systems).toEqual(reader.systems());
    expect(exported.runs).toEqual(reader.runs());
    expect(exported.families.map((f) => f.id)).toEqual(['second-system/B1S1/a', 'test-system/B2S1/a']);
    const family = exported.families[1]!;
    const bundle = bundles[0]!;
    expect(family.orbits).toEqual(bundle.orbits.map(({ familyId: _, ...rest }) => rest));
    expect(family.stableWindows).toEqual(bundle.stableWindows.map(({ familyId: _, ...rest }) => rest));
    expect(family.bifurcations).toEqual(bundle.bifurcations.map(({ familyId: _, ...rest }) => rest));
    expect(family.memberCount).toBe(7);
  });

  it('with familyId exports that family with its own system and run only', () => {
    const exported = exportCatalogJson(reader, { familyId: 'second-system/B1S1/a' });
    expect(issues(exported)).toEqual([]);
    expect(exported.families.map((f) => f.id)).toEqual(['second-system/B1S1/a']);
    expect(exported.systems.map((s) => s.id)).toEqual(['second-system']);
    expect(exported.runs.map((r) => r.id)).toEqual([runIds[1]]);
    expect(() => exportCatalogJson(reader, { familyId: 'nope' })).toThrow('exportCatalogJson: familyId nope is not in the catalog');
  });
});

describe('exportCatalogCsv', () => {
  const parse = (csv: string) => readTable(csv, { type: 'csv', parse: {} }) as Array<Record<string, string>>;

  it('has a header and one row per orbit, with family id and signature, and state0 as x0..vz0', () => {
    const csv = exportCatalogCsv(reader);
    const rows = parse(csv);
    expect(rows).toHaveLength(7 + 4);
    expect(csv.split('\r\n')[0]!.split(',').slice(0, 2)).toEqual(['familyId', 'familySignature']);
    expect(rows.map((r) => r.familyId)).toEqual([...Array(4).fill('second-system/B1S1/a'), ...Array(7).fill('test-system/B2S1/a')]);
    expect(rows.map((r) => r.familySignature)).toEqual([...Array(4).fill('B1S1'), ...Array(7).fill('B2S1')]);
  });

  it('keeps every number exactly and quotes text that needs it', () => {
    const rows = parse(exportCatalogCsv(reader));
    const orbits = reader.orbits();
    const names = ['x0', 'y0', 'z0', 'vx0', 'vy0', 'vz0'];
    for (const [k, orbit] of orbits.entries()) {
      const row = rows[k]!;
      expect(row.orbitId).toBe(orbit.id);
      expect(names.map((n) => Number(row[n]))).toEqual(orbit.state0);
      for (const field of ['jacobi', 'period', 'periodDays', 'stabilityIndex', 'secondaryMinAltKm', 'closureError', 'seq'] as const) {
        expect(Number(row[field]), field).toBe(orbit[field]);
      }
      expect(row.synodicP).toBe(orbit.synodicP === null ? '' : String(orbit.synodicP));
      expect(row.stable).toBe(String(orbit.stable));
      expect(row.familyName).toBe(reader.family(orbit.familyId)!.name); // holds a comma, quotes and a line break
    }
  });

  it('with familyId has that family only', () => {
    const rows = parse(exportCatalogCsv(reader, { familyId: 'test-system/B2S1/a' }));
    expect(rows.map((r) => r.seq)).toEqual(['0', '1', '2', '3', '4', '5', '6']);
    expect(() => exportCatalogCsv(reader, { familyId: 'nope' })).toThrow('exportCatalogCsv: familyId nope is not in the catalog');
  });
});
