// The filtered set as CSV and JSON (made in the browser from the loaded columns; full precision).
import type { FinderTable } from './finder-table.ts';

export interface FinderExportRow {
  id: string;
  family: string;
  familyName: string;
  system: string;
  signature: string;
  jacobi: number;
  periodDays: number;
  stabilityIndex: number;
  verticalStabilityIndex: number;
  primaryMinAltKm: number;
  secondaryMinAltKm: number;
  stable: boolean;
  synodicLock: string | null;
  synodicRelError: number | null;
  holdRadiusKm: number | null;
  sunSurvivingFraction: number | null;
  eccentricitySurvivingFraction: number | null;
}

const nullIfNaN = (v: number) => (Number.isNaN(v) ? null : v);

export function exportRow(table: FinderTable, i: number): FinderExportRow {
  const family = table.meta.families[table.family[i]];
  const lock = table.lock[i];
  const err = table.lockRelError[i];
  return {
    id: table.ids[i],
    family: family?.id ?? '',
    familyName: family?.name ?? '',
    system: table.meta.systems[family?.system ?? -1]?.id ?? '',
    signature: table.meta.signatures[table.signature[i]],
    jacobi: table.jacobi[i],
    periodDays: table.periodDays[i],
    stabilityIndex: table.nu[i],
    verticalStabilityIndex: table.nuV[i],
    primaryMinAltKm: table.primaryAltKm[i],
    secondaryMinAltKm: table.secondaryAltKm[i],
    stable: table.stable[i] === 1,
    synodicLock: lock < 0 ? null : table.meta.locks[lock],
    synodicRelError: nullIfNaN(err),
    holdRadiusKm: nullIfNaN(table.holdKm[i]),
    sunSurvivingFraction: nullIfNaN(table.sun[i]),
    eccentricitySurvivingFraction: nullIfNaN(table.ecc[i]),
  };
}

/** RFC 4180 field: quoted when it holds a comma, quote or line break. */
function csvField(value: unknown): string {
  const text = value === null || value === undefined ? '' : String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

const CSV_COLUMNS: Array<[keyof FinderExportRow, string]> = [
  ['id', 'id'], ['family', 'family_id'], ['familyName', 'family_name'], ['system', 'system_id'],
  ['signature', 'lap_signature'], ['jacobi', 'jacobi_constant'], ['periodDays', 'period_days'],
  ['stabilityIndex', 'stability_index'], ['verticalStabilityIndex', 'vertical_stability_index'],
  ['primaryMinAltKm', 'primary_min_alt_km'], ['secondaryMinAltKm', 'secondary_min_alt_km'], ['stable', 'stable'],
  ['synodicLock', 'synodic_lock'], ['synodicRelError', 'synodic_rel_error'], ['holdRadiusKm', 'hold_radius_km'],
  ['sunSurvivingFraction', 'sun_surviving_fraction'], ['eccentricitySurvivingFraction', 'eccentricity_surviving_fraction'],
];

export function rowsToCsv(table: FinderTable, rows: Int32Array, count: number): string {
  const lines = [CSV_COLUMNS.map(([, header]) => header).join(',')];
  for (let k = 0; k < count; k++) {
    const row = exportRow(table, rows[k]);
    lines.push(CSV_COLUMNS.map(([field]) => csvField(row[field])).join(','));
  }
  return `${lines.join('\r\n')}\r\n`;
}

export function rowsToJson(table: FinderTable, rows: Int32Array, count: number, query: string): string {
  const orbits: FinderExportRow[] = [];
  for (let k = 0; k < count; k++) orbits.push(exportRow(table, rows[k]));
  return JSON.stringify({ query, count, orbits }, null, 1);
}
