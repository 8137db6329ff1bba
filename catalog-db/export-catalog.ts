// Whole-catalog (or one-family) downloads: nested JSON with every stored field, and a flat CSV of
// orbits for spreadsheets (without eigenvalues, monodromy, curves and per-phase screening lists,
// which the JSON carries). Both add per orbit its hold radius, its screenings and whether it is a
// vertically critical member (orbit-annotations.ts).
import {
  CATALOG_EXPORT_FORMAT_VERSION,
  type CatalogExport,
  type CatalogExportFamily,
  type CatalogExportOrbit,
  type CatalogExportScreening,
} from './catalog-export-types.ts';
import { formatCsvRecord, type CsvValue } from './csv-field.ts';
import { annotateFamilyOrbits, type OrbitAnnotations } from './orbit-annotations.ts';
import type { CatalogReader, FamilyRow, ModelScreeningRow, OrbitRow } from './types.ts';

export interface ExportOptions {
  familyId?: string; // only this family (with its system and run)
  generatedAt?: string; // ISO 8601; defaults to now (set it for reproducible files)
}

export function exportCatalogJson(reader: CatalogReader, options: ExportOptions = {}): CatalogExport {
  const families = selectFamilies(reader, options.familyId, 'exportCatalogJson');
  const systemIds = new Set(families.map((family) => family.systemId));
  const runIds = new Set(families.map((family) => family.runId));
  const single = options.familyId !== undefined;
  return {
    formatVersion: CATALOG_EXPORT_FORMAT_VERSION,
    generatedAt: options.generatedAt ?? new Date().toISOString(),
    scenario: reader.scenario(),
    runs: reader.runs().filter((run) => !single || runIds.has(run.id)),
    systems: reader.systems().filter((system) => !single || systemIds.has(system.id)),
    families: families.map((family) => exportFamily(reader, family)),
  };
}

function exportFamily(reader: CatalogReader, family: FamilyRow): CatalogExportFamily {
  const { endReasonStart, endReasonEnd, ...rest } = family;
  const orbits = reader.orbits(family.id);
  const bifurcations = reader.bifurcations(family.id);
  const notes = annotateFamilyOrbits(reader, family.id, orbits, bifurcations);
  return {
    ...rest,
    endReasons: { start: endReasonStart, end: endReasonEnd },
    orbits: orbits.map((orbit) => exportOrbit(orbit, notes)),
    stableWindows: reader.stableWindows(family.id).map(({ familyId: _, ...window }) => window),
    bifurcations: bifurcations.map(({ familyId: _, ...bifurcation }) => bifurcation),
  };
}

/** The orbit's row, plus holdRadius, screenings and verticalBranchPoint where it has them. */
function exportOrbit({ familyId: _, ...orbit }: OrbitRow, notes: OrbitAnnotations): CatalogExportOrbit {
  const out: CatalogExportOrbit = { ...orbit };
  const hold = notes.holdRadius.get(orbit.id);
  if (hold !== undefined) {
    const { orbitId: _o, familyId: _f, ...holdRadius } = hold;
    out.holdRadius = holdRadius;
  }
  const screened = notes.screenings.get(orbit.id);
  if (screened !== undefined) {
    out.screenings = {};
    if (screened.bicircular) out.screenings.bicircular = screeningOf(screened.bicircular);
    if (screened.elliptic) out.screenings.elliptic = screeningOf(screened.elliptic);
  }
  const branch = notes.verticalBranchPoint.get(orbit.id);
  if (branch !== undefined) out.verticalBranchPoint = { ...branch };
  return out;
}

function screeningOf({ orbitId: _o, familyId: _f, model: _m, ...rest }: ModelScreeningRow): CatalogExportScreening {
  return rest;
}

/** Columns of the CSV, in order: header name and how to get the value (new columns go last). */
const csvColumns: ReadonlyArray<readonly [string, (family: FamilyRow, orbit: OrbitRow, notes: OrbitAnnotations) => CsvValue]> = [
  ['familyId', (f) => f.id],
  ['familySignature', (f) => f.signature],
  ['familyName', (f) => f.name],
  ['orbitId', (_, o) => o.id],
  ['seq', (_, o) => o.seq],
  ['arclength', (_, o) => o.arclength],
  ['x0', (_, o) => o.state0[0]],
  ['y0', (_, o) => o.state0[1]],
  ['z0', (_, o) => o.state0[2]],
  ['vx0', (_, o) => o.state0[3]],
  ['vy0', (_, o) => o.state0[4]],
  ['vz0', (_, o) => o.state0[5]],
  ['jacobi', (_, o) => o.jacobi],
  ['period', (_, o) => o.period],
  ['periodDays', (_, o) => o.periodDays],
  ['stabilityIndex', (_, o) => o.stabilityIndex],
  ['verticalStabilityIndex', (_, o) => o.verticalStabilityIndex],
  ['stable', (_, o) => o.stable],
  ['primaryMinRadiusKm', (_, o) => o.primaryMinRadiusKm],
  ['primaryMinAltKm', (_, o) => o.primaryMinAltKm],
  ['secondaryMinRadiusKm', (_, o) => o.secondaryMinRadiusKm],
  ['secondaryMinAltKm', (_, o) => o.secondaryMinAltKm],
  ['maxDistanceKm', (_, o) => o.maxDistanceKm],
  ['l1Passages', (_, o) => o.l1Passages],
  ['signature', (_, o) => o.signature],
  ['synodicP', (_, o) => o.synodicP],
  ['synodicQ', (_, o) => o.synodicQ],
  ['synodicRelError', (_, o) => o.synodicRelError],
  ['closureError', (_, o) => o.closureError],
  ['jacobiDrift', (_, o) => o.jacobiDrift],
  // Empty where the member was not screened (or the model not run for it).
  ['holdRadiusKm', (_, o, n) => n.holdRadius.get(o.id)?.holdRadiusKm ?? null],
  ['sunSurvivingFraction', (_, o, n) => n.screenings.get(o.id)?.bicircular?.survivingFraction ?? null],
  ['eccentricitySurvivingFraction', (_, o, n) => n.screenings.get(o.id)?.elliptic?.survivingFraction ?? null],
  // 1 or -1 on a vertically critical member (branch point of a spatial family), empty elsewhere.
  ['verticalCriticalIndex', (_, o, n) => n.verticalBranchPoint.get(o.id)?.verticalIndex ?? null],
];

/** One row per orbit after a header row; families in catalog order, orbits in family order. */
export function exportCatalogCsv(reader: CatalogReader, options: Pick<ExportOptions, 'familyId'> = {}): string {
  const families = selectFamilies(reader, options.familyId, 'exportCatalogCsv');
  const lines = [formatCsvRecord(csvColumns.map(([name]) => name))];
  for (const family of families) {
    const orbits = reader.orbits(family.id);
    const notes = annotateFamilyOrbits(reader, family.id, orbits, reader.bifurcations(family.id));
    for (const orbit of orbits) {
      lines.push(formatCsvRecord(csvColumns.map(([, value]) => value(family, orbit, notes))));
    }
  }
  return lines.join('');
}

function selectFamilies(reader: CatalogReader, familyId: string | undefined, where: string): FamilyRow[] {
  if (familyId === undefined) return reader.families();
  const family = reader.family(familyId);
  if (family === undefined) throw new Error(`${where}: familyId ${familyId} is not in the catalog`);
  return [family];
}
