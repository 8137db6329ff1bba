// Shape of the JSON export (a public contract, described for other tools by catalog-export.schema.json).
// Nested rows leave out familyId: the family they sit in says it.
import type {
  BifurcationRow,
  FamilyRow,
  SignatureChangeRow,
  HoldRadiusRow,
  ModelScreeningRow,
  OrbitRow,
  RunRow,
  ScenarioMeta,
  StableWindowRow,
  SystemRow,
} from './types.ts';

/** Bump when a name or meaning in the export changes (independent of the SQLite schema version). */
export const CATALOG_EXPORT_FORMAT_VERSION = 1;

export type CatalogExportHoldRadius = Omit<HoldRadiusRow, 'orbitId' | 'familyId'>;
export type CatalogExportScreening = Omit<ModelScreeningRow, 'orbitId' | 'familyId' | 'model'>;

/** A vertically critical member (vertical index = ±1): a branch point of a spatial family. */
export interface CatalogExportVerticalBranchPoint {
  bifurcationId: string;
  verticalIndex: 1 | -1;
}

export interface CatalogExportOrbit extends Omit<OrbitRow, 'familyId'> {
  /** Present for members whose hold radius was computed. */
  holdRadius?: CatalogExportHoldRadius;
  /** Present for screened members; a model is absent when it was not run for this member. */
  screenings?: { bicircular?: CatalogExportScreening; elliptic?: CatalogExportScreening };
  /** Present on the member where the vertical index crosses +1 or −1. */
  verticalBranchPoint?: CatalogExportVerticalBranchPoint;
}

export type CatalogExportStableWindow = Omit<StableWindowRow, 'familyId'>;
export type CatalogExportBifurcation = Omit<BifurcationRow, 'familyId'>;
export type CatalogExportSignatureChange = Omit<SignatureChangeRow, 'familyId'>;

export interface CatalogExportFamily extends Omit<FamilyRow, 'endReasonStart' | 'endReasonEnd'> {
  endReasons: { start: string; end: string };
  orbits: CatalogExportOrbit[];
  stableWindows: CatalogExportStableWindow[];
  bifurcations: CatalogExportBifurcation[];
  signatureChanges: CatalogExportSignatureChange[];
}

export interface CatalogExport {
  formatVersion: number;
  generatedAt: string; // ISO 8601
  scenario: ScenarioMeta | null;
  runs: RunRow[];
  systems: SystemRow[];
  families: CatalogExportFamily[];
}
