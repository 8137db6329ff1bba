// Converts camelCase rows (types.ts) to snake_case SQLite records and back, checking every value on
// the way in: SQLite would quietly turn NaN into NULL and JSON.stringify would turn it into null, so a
// bad number is refused here with the row and field named instead.
// Every finite double reads back exactly, except −0, which comes back as +0 (SQLite REAL and JSON
// both drop the sign of zero; it equals +0 under ===).

/** How a field is stored. Arrays are JSON text; booleans are 0/1; a trailing ? allows null. */
export type ColumnKind =
  | 'text'
  | 'text?'
  | 'int'
  | 'int?'
  | 'real'
  | 'real?'
  | 'bool'
  | 'state6' // [x, y, z, vx, vy, vz]
  | 'complexList' // [[re, im], ...]
  | 'matrix36' // 6×6 row-major
  | 'realList' // [a, b, ...], any length (also empty)
  | 'intOrNullList' // [1, null, 3, ...]
  | 'realRecord'; // {"name": number, ...}

type Vector6 = [number, number, number, number, number, number];

/** The kinds that fit a field of type T (never when none does, which fails to compile). */
type KindOf<T> = [T] extends [boolean]
  ? 'bool'
  : [T] extends [number]
    ? 'int' | 'real'
    : [T] extends [number | null]
      ? 'int?' | 'real?'
      : [T] extends [string]
        ? 'text'
        : [T] extends [string | null]
          ? 'text?'
          : [T] extends [Vector6]
            ? 'state6'
            : [T] extends [Array<[number, number]>]
              ? 'complexList'
              : [T] extends [number[]]
                ? 'matrix36' | 'realList'
                : [T] extends [Array<number | null>]
                  ? 'intOrNullList'
                  : [T] extends [Record<string, number>]
                    ? 'realRecord'
                    : never;

/** One entry per field of Row, none missing. */
export type ColumnSpec<Row> = { readonly [K in keyof Row]-?: KindOf<Row[K]> };

export type SqlValue = string | number | null;
export type SqlRecord = Record<string, SqlValue>;

export interface RowMapper<Row> {
  readonly label: string; // used in error messages, e.g. "orbit"
  readonly table: string;
  readonly columns: readonly string[]; // snake_case, in field order
  readonly insertSql: string; // INSERT with one @named parameter per column
  toRecord(row: Row): SqlRecord;
  fromRecord(record: SqlRecord): Row;
}

/** lengthUnitKm -> length_unit_km, l1Passages -> l1_passages, state0 -> state0. */
export function columnName(field: string): string {
  return field.replace(/[A-Z]/g, (letter) => `_${letter.toLowerCase()}`);
}

export function createRowMapper<Row>(label: string, table: string, spec: ColumnSpec<Row>): RowMapper<Row> {
  const fields = Object.entries(spec as Record<string, ColumnKind>).map(([field, kind]) => ({
    field,
    column: columnName(field),
    kind,
  }));
  const columns = fields.map((f) => f.column);
  return {
    label,
    table,
    columns,
    insertSql: `INSERT INTO ${table} (${columns.join(', ')}) VALUES (${columns.map((c) => `@${c}`).join(', ')})`,
    toRecord(row) {
      const source = row as Record<string, unknown>;
      const rowName = describeRowName(source);
      const record: SqlRecord = {};
      for (const { field, column, kind } of fields) {
        record[column] = encodeValue(source[field], kind, () => `${label}${rowName}: ${field}`);
      }
      return record;
    },
    fromRecord(record) {
      const row: Record<string, unknown> = {};
      for (const { field, column, kind } of fields) row[field] = decodeValue(record[column] ?? null, kind);
      return row as Row;
    },
  };
}

function encodeValue(value: unknown, kind: ColumnKind, where: () => string): SqlValue {
  const fail = (expected: string): never => {
    throw new Error(`${where()} must be ${expected}, got ${describe(value)}`);
  };
  const nullable = kind.endsWith('?');
  if (value === null && nullable) return null;
  switch (kind) {
    case 'text':
    case 'text?':
      return typeof value === 'string' ? value : fail(nullable ? 'a string or null' : 'a string');
    case 'int':
    case 'int?':
      return Number.isSafeInteger(value) ? (value as number) : fail(nullable ? 'an integer or null' : 'an integer');
    case 'real':
    case 'real?':
      return isFiniteNumber(value) ? value : fail(nullable ? 'a finite number or null' : 'a finite number');
    case 'bool':
      return typeof value === 'boolean' ? (value ? 1 : 0) : fail('true or false');
    case 'state6':
      return isFiniteArray(value, 6) ? JSON.stringify(value) : fail('an array of 6 finite numbers');
    case 'matrix36':
      return isFiniteArray(value, 36) ? JSON.stringify(value) : fail('an array of 36 finite numbers (6×6, row-major)');
    case 'complexList':
      return Array.isArray(value) && value.every((pair) => isFiniteArray(pair, 2))
        ? JSON.stringify(value)
        : fail('an array of [re, im] pairs of finite numbers');
    case 'realList':
      return Array.isArray(value) && value.every(isFiniteNumber) ? JSON.stringify(value) : fail('an array of finite numbers');
    case 'intOrNullList':
      return Array.isArray(value) && value.every((v) => v === null || Number.isSafeInteger(v))
        ? JSON.stringify(value)
        : fail('an array of integers or nulls');
    case 'realRecord':
      return value !== null && typeof value === 'object' && !Array.isArray(value) && Object.values(value).every(isFiniteNumber)
        ? JSON.stringify(value)
        : fail('an object of finite numbers');
  }
}

/** " <id>" for rows with an id; rows keyed by their orbit (and model) name those instead. */
function describeRowName(source: Record<string, unknown>): string {
  if (typeof source.id === 'string' || typeof source.id === 'number') return ` ${source.id}`;
  const parts = [source.orbitId, source.model].filter((part) => typeof part === 'string');
  return parts.length > 0 ? ` ${parts.join(' ')}` : '';
}

function decodeValue(value: SqlValue, kind: ColumnKind): unknown {
  if (value === null) return null;
  switch (kind) {
    case 'bool':
      return value === 1;
    case 'state6':
    case 'matrix36':
    case 'complexList':
    case 'realList':
    case 'intOrNullList':
    case 'realRecord':
      return JSON.parse(value as string);
    default:
      return value;
  }
}

function isFiniteNumber(value: unknown): value is number {
  return typeof value === 'number' && Number.isFinite(value);
}

function isFiniteArray(value: unknown, length: number): boolean {
  return Array.isArray(value) && value.length === length && value.every(isFiniteNumber);
}

function describe(value: unknown): string {
  if (Array.isArray(value)) return `an array of length ${value.length}`;
  if (typeof value === 'string') return JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}…` : value);
  if (typeof value === 'number' || typeof value === 'boolean' || value == null) return String(value);
  return typeof value;
}
