// The filtered set as CSV and JSON (made in the browser from the loaded columns; full precision): the
// export columns (every finder field of the orbit-field table, the start state also in km, km/s) under the
// catalog export's CSV names with its quoting, after the metadata (comment lines in CSV, fields in JSON).
import { formatCsvRecord } from '../../../catalog-db/csv-field.ts';
import { EXPORT_COLUMNS, type ExportRow } from './export-columns.ts';
import { exportMetadata, metadataCommentLines } from './export-metadata.ts';
import { rowValues, type FinderTable } from './finder-table.ts';

function exportRows(table: FinderTable, rows: Int32Array, count: number): ExportRow[] {
  const systems = new Map(table.systems.map((s) => [s.id, s]));
  const out: ExportRow[] = [];
  for (let k = 0; k < count; k++) {
    const row = rowValues(table, rows[k]!);
    const system = systems.get(String(row.systemId));
    out.push(Object.fromEntries(EXPORT_COLUMNS.map((column) => [column.key, column.value(row, system)])));
  }
  return out;
}

export function rowsToCsv(table: FinderTable, rows: Int32Array, count: number, query: string): string {
  const lines = [metadataCommentLines(exportMetadata(table, rows, count, query)), formatCsvRecord(EXPORT_COLUMNS.map((c) => c.key))];
  for (const row of exportRows(table, rows, count)) lines.push(formatCsvRecord(EXPORT_COLUMNS.map((c) => row[c.key] ?? null)));
  return lines.join('');
}

export function rowsToJson(table: FinderTable, rows: Int32Array, count: number, query: string): string {
  return JSON.stringify({ ...exportMetadata(table, rows, count, query), orbits: exportRows(table, rows, count) }, null, 1);
}
