// Build-time: every orbit of the catalog as the finder's column file, one column per finder field of the
// orbit-field table (numbers kept exact, so a filter in the browser selects exactly what the same query
// selects in SQLite).
import { FINDER_FIELDS } from '../../catalog-db/orbit-fields.ts';
import type { FieldValue, OrbitFieldSource } from '../../catalog-db/orbit-field-types.ts';
import { FINDER_DATA_VERSION, FINDER_RUN_KEYS, FINDER_SYSTEM_KEYS, type FinderColumnData, type FinderDataFile } from './finder-data-types.ts';
import type { CatalogSnapshot } from './catalog-source.ts';
import { orbitFieldSource } from './orbit-field-source.ts';

export function finderData(catalog: CatalogSnapshot): FinderDataFile {
  const sources: OrbitFieldSource[] = catalog.pagedOrbits.map((orbit) => orbitFieldSource(catalog, orbit));
  const columns: Record<string, FinderColumnData> = {};
  for (const field of FINDER_FIELDS) {
    const values: FieldValue[] = sources.map((source) => field.get(source));
    if (field.type !== 'text') {
      columns[field.key] = { values: values.map((v) => (v === null ? null : Number(v))) };
      continue;
    }
    const dict = [...new Set(values.filter((v): v is string => v !== null).map(String))].sort(field.compareText ?? ((a, b) => a.localeCompare(b)));
    const code = new Map(dict.map((text, i) => [text, i]));
    columns[field.key] = { dict, codes: values.map((v) => (v === null ? -1 : code.get(String(v))!)) };
  }
  const systems = catalog.systems.map((s) => pick(s, FINDER_SYSTEM_KEYS));
  const runs = catalog.runs.map((r) => pick(r, FINDER_RUN_KEYS));
  return { version: FINDER_DATA_VERSION, count: sources.length, columns, systems, runs };
}

function pick<T, K extends keyof T>(row: T, keys: readonly K[]): Pick<T, K> {
  return Object.fromEntries(keys.map((key) => [key, row[key]])) as Pick<T, K>;
}
