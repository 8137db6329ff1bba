// Public surface of the catalog layer (re-exports only).
export type * from './types.ts';
export type * from './catalog-export-types.ts';
export { CATALOG_EXPORT_FORMAT_VERSION } from './catalog-export-types.ts';
export { CATALOG_SCHEMA_VERSION } from './schema-version.ts';
export { openCatalogForRead, openCatalogForWrite } from './open-catalog.ts';
export { exportCatalogCsv, exportCatalogJson, type ExportOptions } from './export-catalog.ts';
export { mergeCatalogs, type MergeInputReport, type MergeReport } from './merge-catalogs.ts';
export { stableWindowRow } from '../generator/core/orbits/stable-window-row.ts';
export { familySummary } from '../generator/core/orbits/family-summary.ts';
export type { FamilySummary } from '../generator/core/orbits/family-summary.ts';
