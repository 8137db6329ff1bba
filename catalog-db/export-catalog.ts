// Whole-catalog (or one-family) downloads: nested JSON with every stored field, and a flat CSV of
// orbits for spreadsheets (without eigenvalues and monodromy, which the JSON carries).
import {
  CATALOG_EXPORT_FORMAT_VERSION,
  type CatalogExport,
  type CatalogExportFamily,
} from './catalog-export-types.ts';
import { formatCsvRecord, type CsvValue } from './csv-field.ts';
import type { CatalogReader, FamilyRow, OrbitRow } from './types.ts';

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
  return {
    ...rest,
    endReasons: { start: endReasonStart, end: endReasonEnd },
    orbits: reader.orbits(family.id).map(({ familyId: _, ...orbit }) => orbit),
    stableWindows: reader.stableWindows(family.id).map(({ familyId: _, ...window }) => window),
    bifurcations: reader.bifurcations(family.id).map(({ familyId: _, ...bifurcation }) => bifurcation),
  };
}

/** Columns of the CSV, in order: header name and how to get the value. */
const csvColumns: ReadonlyArray<readonly [string, (family: FamilyRow, orbit: OrbitRow) => CsvValue]> = [
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
];

/** One row per orbit after a header row; families in catalog order, orbits in family order. */
export function exportCatalogCsv(reader: CatalogReader, options: Pick<ExportOptions, 'familyId'> = {}): string {
  const families = selectFamilies(reader, options.familyId, 'exportCatalogCsv');
  const lines = [formatCsvRecord(csvColumns.map(([name]) => name))];
  for (const family of families) {
    for (const orbit of reader.orbits(family.id)) {
      lines.push(formatCsvRecord(csvColumns.map(([, value]) => value(family, orbit))));
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
