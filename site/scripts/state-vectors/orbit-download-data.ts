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
}
