// What an orbit page hands its browser script (embedded as JSON): enough to propagate and label files.

export interface OrbitDownloadData {
  orbitId: string;
  familyName: string;
  systemName: string;
  mu: number;
  lengthUnitKm: number;
  timeUnitS: number;
  primaryName: string;
  secondaryName: string;
  state0: number[]; // nondimensional x, y, z, vx, vy, vz
  periodNd: number;
  fileStem: string; // safe file name stem
  /** The primaries are the Earth and the Moon, so the epoch-dated Earth-centred frame can be offered. */
  earthMoon: boolean;
}

/** Whether a system's primaries are the Earth and the Moon (the dated frame needs the Moon's ephemeris). */
export function isEarthMoon(primaryName: string, secondaryName: string): boolean {
  return primaryName.trim().toLowerCase() === 'earth' && secondaryName.trim().toLowerCase() === 'moon';
}
