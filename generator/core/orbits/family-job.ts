// What one unit of generator work asks for (a "job": one config entry for one system) and what it yields.
// The run layer builds jobs from the validated config and writes the bundles to the catalog.
import type { FamilyBundle } from './family-rows.ts';
import type { DiscoveryResult } from './discovery/discover-candidates.ts';
import type { StoredFamily } from './stored-family-trace.ts';
import type { Tolerance } from '../propagation/tolerance.ts';

import type { AxisSegment } from '../cr3bp/axis-segment.ts';

export type { AxisSegment };

export type SeedRule =
  | {
    /**
     * Symmetric orbits of one lap signature, found on the zero set of the perpendicular-crossing residual
     * over a grid of start points x0 (per segment) and Jacobi levels (discovery/).
     */
    kind: 'lap-signature';
    signature: string; // e.g. "E2M1" (letters of the system)
    jacobiValues: number[]; // the grid's Jacobi levels (dense near C(L1); config: search.jacobi*)
    segments: AxisSegment[];
    /** Start direction(s) of ẏ: +1, −1. */
    directions: Array<1 | -1>;
    /** Largest crossing count of y = 0 tried for the half period. */
    maxHalfCrossings: number;
    /** Start points per segment in the scan. */
    gridPoints: number;
  }
  | { kind: 'lyapunov'; point: 'L1' | 'L2'; amplitudeNd: number }
  | { kind: 'retrograde'; distanceNd: number };

export interface FamilyLimits {
  maxMembers: number; // per family, both directions together
  jacobiMin: number;
  jacobiMax: number;
  maxPeriodNd: number;
  /** Opt-in: stop following a family once |ν| has stayed above indexAbove for this many members in a row. */
  unstableStop: { indexAbove: number; members: number } | null;
  initialStepNd: number; // first pseudo-arclength step
  maxStepNd: number;
}

export interface SystemSpec {
  id: string;
  name: string;
  mu: number;
  lengthUnitKm: number;
  timeUnitS: number;
  primaryName: string;
  secondaryName: string;
  primaryLetter: string;
  secondaryLetter: string;
  primaryRadiusKm: number;
  secondaryRadiusKm: number;
  synodicPeriodDays: number | null;
  source: string;
}

/**
 * Screenings of stable members "beyond the three-body model" (core/beyond): the hold radius of the middle
 * member of every stable window and membersPerWindow more across it; the Sun (bicircular model) and the
 * Moon's eccentricity (elliptic model) for every stable member inside a window.
 */
export interface ScreeningSettings {
  holdRadius: { enabled: boolean; returns: number; membersPerWindow: number };
  /** Span in the system's synodic months; skipped (and said so) for a system without one. */
  sun: { enabled: boolean; spanSynodicMonths: number; phases: number };
  /** Span in synodic months (the secondary's orbital periods for a system without a synodic month). */
  eccentricity: { enabled: boolean; spanSynodicMonths: number; phases: number };
}

export interface FamilyJob {
  /** Stable key of the config entry (resume skips finished keys), e.g. "earth-moon:E2M1". */
  key: string;
  /** Display name for the family or families it yields (from the config; any characters). */
  name: string;
  system: SystemSpec;
  seed: SeedRule;
  limits: FamilyLimits;
  tolerance: Tolerance;
  /** Window edges located to this accuracy in ν. */
  indexTolerance: number;
  /** Screenings of the stable members (absent: none, as with every setting disabled). */
  screening?: ScreeningSettings;
}

export interface JobProgress {
  jobKey: string;
  familyLabel: string; // e.g. "E2M1/b"
  familiesDone: number;
  members: number; // members of the family in progress so far
  maxMembers: number;
}

/** Progress of a job's own discovery grids (when the run layer did not share them). */
export interface DiscoveryProgress {
  jobKey: string;
  gridsDone: number;
  grids: number;
  pointsDone: number; // of the grid in progress
  points: number;
}

export interface JobHooks {
  onProgress?(progress: JobProgress): void;
  onDiscovery?(progress: DiscoveryProgress): void;
  /** A family is finished (continued, windows located, screened): the run layer may write it at once. */
  onFamily?(bundle: FamilyBundle): void;
  /** Polled between members; true stops the job after the current member (interrupted families are marked so). */
  shouldStop?(): boolean;
}

/**
 * What the run layer may hand a job ready-made: discovery grids shared by the jobs of a system, and the
 * finished families an earlier, stopped run of this job already wrote (resume goes on after them).
 */
export interface JobInputs {
  discovered?: readonly DiscoveryResult[];
  stored?: readonly StoredFamily[];
  /**
   * Orbits other families continue into (past a change of lap signature; state at t = 0 and period,
   * nondimensional) that no catalogued family holds. When given, the job follows each as a family of
   * its own and runs no seed search.
   */
  handoffs?: readonly { state0: readonly number[]; periodNd: number }[];
}

export interface JobResult {
  /** Families found, complete unless `interrupted`. runId is 0: the writer sets it. */
  bundles: FamilyBundle[];
  interrupted: boolean;
  /** One-line remarks for the run log, e.g. a screening skipped and why. */
  notes?: string[];
  /** Lap-signature jobs: root edges of the signature, those skipped as on a continued family, those tried. */
  seedSearch?: { candidates: number; covered: number; tried: number };
}
