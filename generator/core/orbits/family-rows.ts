// The rows a finished family is handed back as (nondimensional values plus km and days). The core owns
// them so that it needs no catalog-db import; catalog-db/types.ts re-exports them as the storage contract.
import type { HoldRadiusRow, ModelScreeningRow } from './screening-rows.ts';

export type FamilyKind = 'cycler' | 'lyapunov-l1' | 'lyapunov-l2' | 'retrograde' | 'other';

export interface FamilyRow {
  id: string; // stable id, e.g. "earth-moon/E2M1/a"
  systemId: string;
  runId: number;
  configKey: string; // the job (config entry) that produced it, used by resume
  name: string; // display name from the config (may contain any characters)
  kind: FamilyKind;
  signature: string; // e.g. "E3M2"; reference families use their own label, e.g. "L1-Lyapunov"
  primaryLaps: number;
  secondaryLaps: number;
  seedSegment: string; // "far-primary" | "between" | "far-secondary"
  endReasonStart: string; // why continuation stopped at the start end
  endReasonEnd: string; // why it stopped at the other end
  memberCount: number;
  jacobiMin: number;
  jacobiMax: number;
  periodDaysMin: number;
  periodDaysMax: number;
  stableWindowCount: number;
}

export interface OrbitRow {
  id: string; // e.g. "earth-moon/E2M1/a/0042"
  familyId: string;
  seq: number; // order along the family (0, 1, 2, ...)
  arclength: number; // continuation parameter s at this member
  state0: [number, number, number, number, number, number]; // x,y,z,vx,vy,vz at t = 0
  jacobi: number;
  period: number; // nondimensional
  periodDays: number;
  stabilityIndex: number; // in-plane ν = (λ + 1/λ)/2
  verticalStabilityIndex: number;
  eigenvalues: Array<[number, number]>; // the four non-unit eigenvalues of the monodromy, [re, im]
  monodromy: number[]; // 36 numbers, row-major
  primaryMinRadiusKm: number; // closest distance to the larger body's centre
  primaryMinAltKm: number; // ... minus its radius
  secondaryMinRadiusKm: number;
  secondaryMinAltKm: number;
  maxDistanceKm: number; // largest distance from the barycentre
  l1Passages: number; // crossings of the plane x = x(L1) inside the neck over one period
  signature: string;
  synodicP: number | null; // period / synodic month ≈ p / q
  synodicQ: number | null;
  synodicRelError: number | null;
  closureError: number; // |state(T) − state(0)|, nondimensional
  jacobiDrift: number; // |C(T) − C(0)|
  stable: boolean; // in-plane |ν| < 1 (the vertical index is reported on its own)
}

export interface StableWindowRow {
  id: string;
  familyId: string;
  fromJacobi: number;
  toJacobi: number;
  fromSecondaryMinAltKm: number;
  toSecondaryMinAltKm: number;
  widthKm: number;
  widthJacobi: number;
  fromArclength: number;
  toArclength: number;
  midOrbitId: string;
  midPeriodDays: number;
}

export type BifurcationKind = 'tangent' | 'period-doubling';
export type StabilityPlane = 'in-plane' | 'vertical';

export interface BifurcationRow {
  id: string;
  familyId: string;
  kind: BifurcationKind; // ν = +1 tangent, ν = −1 period doubling
  plane: StabilityPlane; // which index crossed ±1
  arclength: number;
  jacobi: number;
  secondaryMinAltKm: number;
  periodDays: number;
  state0: [number, number, number, number, number, number];
}

/**
 * A family end where the lap signature changes: the first corrected orbit past it (it has the new
 * signature) and the catalogued family that orbit lies on, the one this family continues into.
 */
export interface SignatureChangeRow {
  familyId: string;
  side: 'start' | 'end';
  signature: string; // of the orbit past the end
  state0: [number, number, number, number, number, number];
  jacobi: number;
  period: number; // nondimensional
  periodDays: number;
  intoFamilyId: string | null; // null until the run has found (or continued) that family
  followedUp: boolean; // a run has followed the orbit as a family of its own job (done once)
}

/** A family with everything under it, as written in one transaction. */
export interface FamilyBundle {
  family: FamilyRow;
  orbits: OrbitRow[];
  stableWindows: StableWindowRow[];
  bifurcations: BifurcationRow[];
  /** Hold radius of screened stable members (absent: none screened). */
  holdRadii?: HoldRadiusRow[];
  /** Sun (bicircular) and eccentricity (elliptic) screenings of stable members. */
  modelScreenings?: ModelScreeningRow[];
  /** Its ends where the lap signature changes (absent: none). */
  signatureChanges?: SignatureChangeRow[];
}
