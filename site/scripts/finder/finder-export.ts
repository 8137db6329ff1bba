// The filtered set as CSV and JSON (made in the browser from the loaded columns; full precision): every
// finder field of the orbit-field table, JSON under the field keys, CSV under the fields' CSV columns
// (the catalog export's names) with the catalog's CSV quoting.
import { formatCsvRecord } from '../../../catalog-db/csv-field.ts';
import type { FieldValue } from '../../../catalog-db/orbit-field-types.ts';
import { FINDER_FIELDS } from '../../../catalog-db/orbit-fields.ts';
import { rowValues, type FinderTable } from './finder-table.ts';

const CSV_FIELDS = FINDER_FIELDS.filter((field) => field.csv !== null);

export function rowsToCsv(table: FinderTable, rows: Int32Array, count: number): string {
  const lines = [formatCsvRecord(CSV_FIELDS.map((field) => field.csv!))];
  for (let k = 0; k < count; k++) {
    const row = rowValues(table, rows[k]!);
    lines.push(formatCsvRecord(CSV_FIELDS.map((field) => row[field.key]!)));
  }
  return lines.join('');
}

export function rowsToJson(table: FinderTable, rows: Int32Array, count: number, query: string): string {
  const orbits: Array<Record<string, FieldValue>> = [];
  for (let k = 0; k < count; k++) orbits.push(rowValues(table, rows[k]!));
  return JSON.stringify({ query, count, orbits }, null, 1);
}
