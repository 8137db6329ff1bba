// The JSON and CSV exports with hold radii, screenings and vertical branch points. The JSON is checked
// against catalog-db/catalog-export.schema.json with zod 4's z.fromJSONSchema (an independent reader of
// JSON Schema draft 2020-12); the CSV is read back with vega's CSV reader (d3-dsv, an independent RFC 4180
// parser). Names are those of the contract in generator/core/orbits/screening-rows.ts.
import { readFileSync } from 'node:fs';
import { read as readTable } from 'vega';
import { beforeAll, describe, expect, it } from 'vitest';
import { z } from 'zod';
import { exportCatalogCsv, exportCatalogJson } from '../../catalog-db/export-catalog.ts';
import { openCatalogForRead, openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import type { CatalogReader, FamilyBundle } from '../../catalog-db/types.ts';
import { makeBundle, makeRunInput, makeScenario, makeSystem } from '../catalog-db/make-rows.ts';
import { useTempCatalogDir } from '../catalog-db/temp-catalog-path.ts';
import { withScreenings } from './make-screening-rows.ts';

const catalogPath = useTempCatalogDir();
const schemaJson = JSON.parse(readFileSync(new URL('../../catalog-db/catalog-export.schema.json', import.meta.url), 'utf8'));
const exportSchema = z.fromJSONSchema(schemaJson);
const familyId = 'test-system/B2S1/a';

let reader: CatalogReader;
let bundle: FamilyBundle;

beforeAll(() => {
  const path = catalogPath('export.sqlite');
  const writer = openCatalogForWrite(path);
  writer.upsertSystem(makeSystem());
  writer.setScenario(makeScenario());
  const runId = writer.startRun(makeRunInput());
  bundle = withScreenings(makeBundle(familyId, { runId, orbitCount: 6 }));
  bundle.bifurcations[0]!.arclength = bundle.orbits[1]!.arclength; // in-plane tangent at orbit 1
  bundle.bifurcations[1]!.arclength = bundle.orbits[4]!.arclength; // vertical period doubling at orbit 4
  writer.writeFamily(bundle);
  writer.writeFamily(makeBundle('test-system/B1S1/a', { runId, orbitCount: 3, signature: 'B1S1' })); // none screened
  writer.close();
  reader = openCatalogForRead(path);
  return () => reader.close();
});

function issues(value: unknown): string[] {
  const result = exportSchema.safeParse(value);
  return result.success ? [] : result.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
}

describe('JSON export with screenings', () => {
  it('validates against the JSON Schema, also as a downloaded file', () => {
    const exported = exportCatalogJson(reader);
    expect(issues(exported)).toEqual([]);
    expect(issues(JSON.parse(JSON.stringify(exported)))).toEqual([]);
  });

  it('adds holdRadius, screenings and verticalBranchPoint to the orbits that have them, and leaves the bifurcations as stored', () => {
    const family = exportCatalogJson(reader).families.find((f) => f.id === familyId)!;
    const [o0, o1, o2, o3, o4] = family.orbits;
    const { orbitId: _o, familyId: _f, ...hold2 } = bundle.holdRadii![0]!;
    expect(o2!.holdRadius).toEqual(hold2);
    expect(o0!.holdRadius?.curveX).toEqual([]);
    expect(Object.keys(o2!.screenings!).sort()).toEqual(['bicircular', 'elliptic']);
    expect(Object.keys(o1!.screenings!)).toEqual(['bicircular']);
    const { orbitId: _a, familyId: _b, model: _m, ...elliptic } = bundle.modelScreenings![0]!;
    expect(o2!.screenings!.elliptic).toEqual(elliptic);
    expect(o3).not.toHaveProperty('holdRadius');
    expect(o3).not.toHaveProperty('screenings');
    expect(o4!.verticalBranchPoint).toEqual({ bifurcationId: `${familyId}/b1`, verticalIndex: -1 });
    expect(o1).not.toHaveProperty('verticalBranchPoint'); // an in-plane change is no spatial branch point
    expect(family.bifurcations).toEqual(bundle.bifurcations.map(({ familyId: _g, ...b }) => b));
    // The old names are untouched: the orbit row itself is all there.
    const { familyId: _x, ...row } = bundle.orbits[2]!;
    expect(o2).toMatchObject(row);
  });

  it('the schema checks the new objects: broken ones fail', () => {
    const exported = exportCatalogJson(reader);
    const at = (copy: any) => copy.families.find((f: any) => f.id === familyId).orbits;
    const broken = (edit: (orbits: any[]) => void) => {
      const copy = structuredClone(exported);
      edit(at(copy));
      return issues(copy);
    };
    expect(broken((o) => delete o[2].holdRadius.holdRadiusKm)).not.toEqual([]);
    expect(broken((o) => (o[2].holdRadius.holdRadiusKm = -3))).not.toEqual([]);
    expect(broken((o) => (o[2].screenings.bicircular.survivingFraction = 1.5))).not.toEqual([]);
    expect(broken((o) => (o[2].screenings.elliptic.firstBrokenPeriods[0] = 'never'))).not.toEqual([]);
    expect(broken((o) => (o[2].screenings.elliptic.parameters.eccentricity = 'small'))).not.toEqual([]);
    expect(broken((o) => (o[4].verticalBranchPoint.verticalIndex = 0))).not.toEqual([]);
    expect(broken((o) => (o[2].screenings.nbody = { any: 1 }))).toEqual([]); // more properties are allowed
  });

  it('documents the contract names in the schema as required', () => {
    expect(schemaJson.$defs.holdRadius.required).toEqual(expect.arrayContaining(['holdRadiusKm', 'holdRadiusNd', 'failingDisplacementKm', 'returns', 'curveX', 'curveVx', 'rotationPerReturnRad']));
    expect(schemaJson.$defs.screening.required).toEqual(expect.arrayContaining(['spanNd', 'phases', 'survivingFraction', 'firstBrokenPeriods', 'phaseRad', 'maxDepartureKm', 'parameters']));
    expect(Object.keys(schemaJson.$defs.orbit.properties)).toEqual(expect.arrayContaining(['holdRadius', 'screenings', 'verticalBranchPoint']));
    expect(schemaJson.$defs.orbit.required).not.toContain('holdRadius'); // optional: unscreened orbits have none
  });
});

describe('CSV export with screenings', () => {
  const parse = (csv: string) => readTable(csv, { type: 'csv', parse: {} }) as Array<Record<string, string>>;

  it('ends with holdRadiusKm, sunSurvivingFraction, eccentricitySurvivingFraction and verticalCriticalIndex, empty where absent', () => {
    const csv = exportCatalogCsv(reader, { familyId });
    const header = csv.split('\r\n')[0]!.split(',');
    expect(header.slice(-4)).toEqual(['holdRadiusKm', 'sunSurvivingFraction', 'eccentricitySurvivingFraction', 'verticalCriticalIndex']);
    expect(header.slice(0, 4)).toEqual(['familyId', 'familySignature', 'familyName', 'orbitId']); // old columns first, unchanged
    const rows = parse(csv);
    const [hold0, hold2] = [bundle.holdRadii![1]!, bundle.holdRadii![0]!];
    const fraction = (i: number, model: string) => bundle.modelScreenings!.find((m) => m.orbitId === bundle.orbits[i]!.id && m.model === model)?.survivingFraction;
    expect(rows.map((r) => r.holdRadiusKm)).toEqual([String(hold0.holdRadiusKm), '', String(hold2.holdRadiusKm), '', '', '']);
    expect(rows.map((r) => r.sunSurvivingFraction)).toEqual(['', String(fraction(1, 'bicircular')), String(fraction(2, 'bicircular')), '', '', '']);
    expect(rows.map((r) => r.eccentricitySurvivingFraction)).toEqual(['', '', String(fraction(2, 'elliptic')), '', '', '']);
    expect(rows.map((r) => r.verticalCriticalIndex)).toEqual(['', '', '', '', '-1', '']);
  });
});
