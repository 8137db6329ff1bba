// The finder's data asset (data/finder.json): one column per field, row i = orbit i. Shared by the build
// (which writes it) and the browser (which reads it into typed arrays).

export const FINDER_DATA_VERSION = 2;

export interface FinderSystem {
  id: string;
  name: string;
  primaryName: string;
  secondaryName: string;
}

export interface FinderFamily {
  id: string;
  name: string;
  signature: string;
  system: number; // index into systems
}

export interface FinderDataFile {
  version: number;
  systems: FinderSystem[];
  families: FinderFamily[];
  signatures: string[]; // distinct orbit lap signatures
  locks: string[]; // distinct synodic locks "p:q"
  count: number;
  columns: {
    id: string[];
    family: number[]; // index into families
    seq: number[];
    signature: number[]; // index into signatures
    jacobi: number[];
    periodDays: number[];
    nu: number[];
    nuV: number[];
    primaryAltKm: number[];
    secondaryAltKm: number[];
    stable: number[]; // 1 stable (in-plane), 0 not
    lock: number[]; // index into locks, −1 for none
    lockRelError: (number | null)[];
    /** Hold radius (km) of screened members, null for the others. */
    holdKm: (number | null)[];
    /** Surviving fraction (0..1) of the Sun (bicircular) and eccentricity (elliptic) screenings, null: not screened. */
    sun: (number | null)[];
    ecc: (number | null)[];
  };
}
