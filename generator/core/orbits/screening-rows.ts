// Rows of the "beyond the CR3BP" results kept per stable orbit: hold radius and the Sun and eccentricity
// screenings. The core returns them (screen-stable-members.ts); written with their family (same
// transaction); read by the site and the export (catalog-db/types.ts re-exports them).

export interface HoldRadiusRow {
  orbitId: string;
  familyId: string;
  /** Largest displacement along the section (toward +x) whose returns stay on an invariant curve. */
  holdRadiusKm: number;
  holdRadiusNd: number;
  /** Smallest displacement found to fail (null when the largest tried still held). */
  failingDisplacementKm: number | null;
  returns: number; // N returns asked per trial
  /** Section points (x, ẋ) of the outermost holding curve, nondimensional, decimated (≤ 400). */
  curveX: number[];
  curveVx: number[];
  rotationPerReturnRad: number | null;
}

export type ScreeningModelName = 'bicircular' | 'elliptic';

export interface ModelScreeningRow {
  orbitId: string;
  familyId: string;
  model: ScreeningModelName;
  spanNd: number; // time (bicircular) or true-anomaly span (elliptic)
  phases: number;
  survivingFraction: number; // 0..1
  /** Per phase, in phase order: 1-based first broken period, or null when it survived the span. */
  firstBrokenPeriods: Array<number | null>;
  phaseRad: number[];
  /** Largest departure on the section over the held periods, per phase (km in position, as x-distance). */
  maxDepartureKm: number[];
  /** The perturbation used: {sunMass, sunDistance, sunRate} or {eccentricity}. */
  parameters: Record<string, number>;
}

export interface OrbitScreenings {
  holdRadius: HoldRadiusRow | null;
  bicircular: ModelScreeningRow | null;
  elliptic: ModelScreeningRow | null;
}
