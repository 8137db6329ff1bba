// The finder's column file decoded into typed arrays (filtering then runs over plain numeric loops), and
// one row read back as field values (for the row renderer and the exports).
import type { FieldValue } from '../../../catalog-db/orbit-field-types.ts';
import { FINDER_FIELDS } from '../../../catalog-db/orbit-fields.ts';
import { FINDER_DATA_VERSION, type FinderDataFile, type FinderRunInfo, type FinderSystemInfo } from '../../lib/finder-data-types.ts';

export interface TextColumn {
  dict: string[];
  codes: Int32Array; // −1: no value
}

export interface FinderTable {
  n: number;
  systems: FinderSystemInfo[];
  runs: FinderRunInfo[];
  /** Number and flag fields by key; NaN where the orbit has no value. */
  numbers: Record<string, Float64Array>;
  texts: Record<string, TextColumn>;
}

export function decodeFinderData(file: FinderDataFile): FinderTable {
  if (file.version !== FINDER_DATA_VERSION) {
    throw new Error(`finder data: version ${file.version} is not the expected ${FINDER_DATA_VERSION}`);
  }
  const table: FinderTable = { n: file.count, systems: file.systems, runs: file.runs, numbers: {}, texts: {} };
  for (const [key, column] of Object.entries(file.columns)) {
    if ('dict' in column) table.texts[key] = { dict: column.dict, codes: Int32Array.from(column.codes) };
    else table.numbers[key] = Float64Array.from(column.values, (v) => (v === null ? NaN : v));
  }
  return table;
}

/** Row i as field values (null where absent), keyed like the orbit-field table. */
export function rowValues(table: FinderTable, i: number): Record<string, FieldValue> {
  const row: Record<string, FieldValue> = {};
  for (const field of FINDER_FIELDS) {
    if (field.type === 'text') {
      const column = table.texts[field.key]!;
      const code = column.codes[i]!;
      row[field.key] = code < 0 ? null : column.dict[code]!;
    } else {
      const v = table.numbers[field.key]![i]!;
      row[field.key] = Number.isNaN(v) ? null : field.type === 'flag' ? v === 1 : v;
    }
  }
  return row;
}
