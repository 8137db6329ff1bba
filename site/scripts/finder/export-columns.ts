// The columns of the finder's bulk exports: every finder field of the orbit-field table (its key, CSV name
// and unit) and, right after the nondimensional start state x0..vz0, the same state in km and km/s,
// converted with the row's system's LU and TU by the one conversion of the site (state-units.ts).
import type { FieldValue } from '../../../catalog-db/orbit-field-types.ts';
import { FINDER_FIELDS } from '../../../catalog-db/orbit-fields.ts';
import type { FinderSystemInfo } from '../../lib/finder-data-types.ts';
import { STATE_KM_KEYS, STATE_KM_UNITS, stateKmList } from '../../lib/state-units.ts';

export type ExportRow = Record<string, FieldValue>;

export interface ExportColumn {
  /** JSON key and CSV column name. */
  key: string;
  unit: string | null;
  value: (row: ExportRow, system: FinderSystemInfo | undefined) => FieldValue;
}

const ND_STATE_KEYS = ['x0', 'y0', 'z0', 'vx0', 'vy0', 'vz0'];

function kmColumns(): ExportColumn[] {
  return STATE_KM_KEYS.map((key, k) => ({
    key,
    unit: STATE_KM_UNITS[k],
    value: (row, system) => {
      const state = ND_STATE_KEYS.map((name) => row[name]);
      if (system === undefined || state.some((v) => typeof v !== 'number')) return null;
      return stateKmList(state as number[], system.lengthUnitKm, system.timeUnitS)[k]!;
    },
  }));
}

function exportColumns(): ExportColumn[] {
  const columns: ExportColumn[] = [];
  for (const field of FINDER_FIELDS) {
    if (field.csv === null) continue;
    columns.push({ key: field.csv, unit: field.unit, value: (row) => row[field.key] ?? null });
    if (field.key === ND_STATE_KEYS[5]) columns.push(...kmColumns());
  }
  if (!columns.some((c) => c.key === STATE_KM_KEYS[0])) throw new Error('export columns: the orbit-field table has no vz0 finder field');
  return columns;
}

export const EXPORT_COLUMNS: readonly ExportColumn[] = exportColumns();
