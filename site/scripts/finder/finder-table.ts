// The finder's column file decoded into typed arrays (filtering then runs over plain numeric loops).
import { FINDER_DATA_VERSION, type FinderDataFile } from './finder-data-types.ts';

export interface FinderTable {
  n: number;
  meta: Omit<FinderDataFile, 'columns'>;
  ids: string[];
  family: Int32Array;
  familySystem: Int32Array; // per family: index of its system
  seq: Int32Array;
  signature: Int32Array;
  jacobi: Float64Array;
  periodDays: Float64Array;
  nu: Float64Array;
  nuV: Float64Array;
  primaryAltKm: Float64Array;
  secondaryAltKm: Float64Array;
  stable: Uint8Array;
  lock: Int32Array;
  lockRelError: Float64Array; // NaN where the orbit has no lock
  holdKm: Float64Array; // NaN where the orbit was not screened
  sun: Float64Array; // surviving fraction, NaN where not screened
  ecc: Float64Array;
}

const orNaN = (v: number | null) => (v === null ? NaN : v);

export function decodeFinderData(file: FinderDataFile): FinderTable {
  if (file.version !== FINDER_DATA_VERSION) {
    throw new Error(`finder data: version ${file.version} is not the expected ${FINDER_DATA_VERSION}`);
  }
  const { columns, ...meta } = file;
  const c = columns;
  return {
    n: file.count,
    meta,
    ids: c.id,
    family: Int32Array.from(c.family),
    familySystem: Int32Array.from(file.families.map((f) => f.system)),
    seq: Int32Array.from(c.seq),
    signature: Int32Array.from(c.signature),
    jacobi: Float64Array.from(c.jacobi),
    periodDays: Float64Array.from(c.periodDays),
    nu: Float64Array.from(c.nu),
    nuV: Float64Array.from(c.nuV),
    primaryAltKm: Float64Array.from(c.primaryAltKm),
    secondaryAltKm: Float64Array.from(c.secondaryAltKm),
    stable: Uint8Array.from(c.stable),
    lock: Int32Array.from(c.lock),
    lockRelError: Float64Array.from(c.lockRelError, orNaN),
    holdKm: Float64Array.from(c.holdKm, orNaN),
    sun: Float64Array.from(c.sun, orNaN),
    ecc: Float64Array.from(c.ecc, orNaN),
  };
}
