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
import { formatCsvRecord } from './csv-field.ts';
import { annotateFamilyOrbits, type OrbitAnnotations } from './orbit-annotations.ts';
import type { OrbitFieldSource } from './orbit-field-types.ts';
import { CATALOG_CSV_FIELDS } from './orbit-fields.ts';
import type { CatalogReader, FamilyRow, ModelScreeningRow, OrbitRow, SystemRow } from './types.ts';

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
    signatureChanges: reader.signatureChanges(family.id).map(({ familyId: _, ...change }) => change),
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

/** What the other tables store for an orbit, as the orbit-field getters read it. */
function fieldSource(family: FamilyRow, system: SystemRow, orbit: OrbitRow, notes: OrbitAnnotations): OrbitFieldSource {
  return {
    orbit, family, system,
    holdRadiusKm: notes.holdRadius.get(orbit.id)?.holdRadiusKm ?? null,
    sunSurvivingFraction: notes.screenings.get(orbit.id)?.bicircular?.survivingFraction ?? null,
    eccentricitySurvivingFraction: notes.screenings.get(orbit.id)?.elliptic?.survivingFraction ?? null,
    verticalCriticalIndex: notes.verticalBranchPoint.get(orbit.id)?.verticalIndex ?? null,
  };
}

/** One row per orbit after a header row (the columns of orbit-fields.ts); families in catalog order, orbits in family order. */
export function exportCatalogCsv(reader: CatalogReader, options: Pick<ExportOptions, 'familyId'> = {}): string {
  const families = selectFamilies(reader, options.familyId, 'exportCatalogCsv');
  const systems = new Map(reader.systems().map((system) => [system.id, system]));
  const lines = [formatCsvRecord(CATALOG_CSV_FIELDS.map((field) => field.csv!))];
  for (const family of families) {
    const system = systems.get(family.systemId);
    if (system === undefined) throw new Error(`exportCatalogCsv: family ${family.id} has no system row ${family.systemId}`);
    const orbits = reader.orbits(family.id);
    const notes = annotateFamilyOrbits(reader, family.id, orbits, reader.bifurcations(family.id));
    for (const orbit of orbits) {
      const source = fieldSource(family, system, orbit, notes);
      lines.push(formatCsvRecord(CATALOG_CSV_FIELDS.map((field) => field.get(source))));
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
