// Public surface of the config layer (re-exports only).
export { loadConfig, parseConfigText, type LoadedConfig } from './load-config.ts';
export { validateConfig, ConfigError } from './validate-config.ts';
export { buildJobs, configSystems } from './build-jobs.ts';
export { catalogConfigShape, type CatalogConfig, type FamilyEntry, type SystemEntry } from './config-schema.ts';
export { DEFAULT_INDEX_TOLERANCE, DEFAULT_LIMITS, DEFAULT_SCREENING, DEFAULT_SEARCH, DEFAULT_TOLERANCE } from './default-settings.ts';
