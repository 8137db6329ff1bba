// Shape of the JSON export (a public contract, described for other tools by catalog-export.schema.json).
// Nested rows leave out familyId: the family they sit in says it.
import type { BifurcationRow, FamilyRow, OrbitRow, RunRow, ScenarioMeta, StableWindowRow, SystemRow } from './types.ts';

/** Bump when a name or meaning in the export changes (independent of the SQLite schema version). */
export const CATALOG_EXPORT_FORMAT_VERSION = 1;

export type CatalogExportOrbit = Omit<OrbitRow, 'familyId'>;
export type CatalogExportStableWindow = Omit<StableWindowRow, 'familyId'>;
export type CatalogExportBifurcation = Omit<BifurcationRow, 'familyId'>;

export interface CatalogExportFamily extends Omit<FamilyRow, 'endReasonStart' | 'endReasonEnd'> {
  endReasons: { start: string; end: string };
  orbits: CatalogExportOrbit[];
  stableWindows: CatalogExportStableWindow[];
  bifurcations: CatalogExportBifurcation[];
}

export interface CatalogExport {
  formatVersion: number;
  generatedAt: string; // ISO 8601
  scenario: ScenarioMeta | null;
  runs: RunRow[];
  systems: SystemRow[];
  families: CatalogExportFamily[];
}
