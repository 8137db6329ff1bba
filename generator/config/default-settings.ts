// Built-in settings used where the config (or the one-family command line) leaves them out.
// Built-in values: a discovery grid dense enough for the complete atlas, limits that only act as safety valves.
import type { AxisSegment, FamilyLimits, ScreeningSettings } from '../core/orbits/family-job.ts';
import type { SystemJacobiBounds } from './system-jacobi-bounds.ts';
import { jacobiGridLevels } from '../core/orbits/discovery/jacobi-grid-levels.ts';

// The core's default (propagation/tolerance.ts), re-exported beside the other config defaults.
export { DEFAULT_TOLERANCE } from '../core/propagation/tolerance.ts';

/** Stable-window edges located to this accuracy in ν. */
export const DEFAULT_INDEX_TOLERANCE = 1e-6;

export const ALL_SEGMENTS: readonly AxisSegment[] = ['far-primary', 'between', 'far-secondary'];

export interface SearchSettings {
  segments: AxisSegment[];
  directions: Array<1 | -1>;
  maxHalfCrossings: number;
  /** Start points per segment of the discovery grid. */
  gridPoints: number;
  /** Jacobi levels of the discovery grid, uniform in log(C(L1) − C). */
  jacobiLevels: number;
  /** C(L1) − C of the highest level. */
  jacobiGapBelowL1: number;
}

/**
 * Discovery grid: crossing counts up to 8 (the half period of an E3M3 cycler crosses y = 0 up to 8 times),
 * 600 start points per segment and 256 levels from the lowest C of the family limits up to 1e-5 below C(L1)
 * (level spacing about 0.005 in C at C(L1) − C = 0.1). Measured by `audit --seed 4242` on Earth–Moon E1M2
 * alone: the earlier 64 × 300 grid left 14 of 42 audited orbits on no family, 192 × 300 left 9, 256 × 600
 * (with the zero-velocity cells) leaves 4, all near-brake orbits whose roots lie within 1e-4 of a
 * collision with the Earth. The grid costs about 110 s per system on 2 cores.
 */
export const DEFAULT_SEARCH: SearchSettings = {
  segments: [...ALL_SEGMENTS],
  directions: [1, -1],
  maxHalfCrossings: 8,
  gridPoints: 600,
  jacobiLevels: 256,
  jacobiGapBelowL1: 1e-5,
};

/** The limits that do not depend on the system (the Jacobi range does; see defaultJacobiLimits). */
export type SystemFreeLimits = Omit<FamilyLimits, 'jacobiMin' | 'jacobiMax'>;

/**
 * A family ends for a reason of its own (continue-family.ts); the member limit is only a safety valve,
 * far above any demo family (the longest had 2,299 members once the closed E2M2 family ended with closed-loop
 * instead of going round it to the limit), and the unstable stop is
 * off unless a config asks for it.
 */
export const DEFAULT_LIMITS: SystemFreeLimits = {
  maxMembers: 5000,
  maxPeriodNd: 40,
  unstableStop: null,
  initialStepNd: 1e-3,
  maxStepNd: 2e-2,
};

export const DEFAULT_LYAPUNOV_AMPLITUDE_ND = 1e-3;

export type FamilyEntryKind = 'lap-signature' | 'lyapunov' | 'retrograde';

/**
 * Where continuation stops in C unless the config says otherwise. A cycler and a Lyapunov orbit pass
 * the L1 neck, which is closed above C(L1), so C(L1) bounds them; retrograde orbits near the smaller
 * body reach far higher C. The lower end sits below the L4/L5 value, where the forbidden region is gone.
 */
export function defaultJacobiLimits(kind: FamilyEntryKind, bounds: SystemJacobiBounds): { jacobiMin: number; jacobiMax: number } {
  const jacobiMin = bounds.l4 - 1;
  return kind === 'retrograde' ? { jacobiMin, jacobiMax: bounds.l1 + 2 } : { jacobiMin, jacobiMax: bounds.l1 };
}

/** The discovery grid's levels: from the lowest C of the family's limits to just below C(L1). */
export function defaultJacobiValues(bounds: SystemJacobiBounds, lowest: number, search: Pick<SearchSettings, 'jacobiLevels' | 'jacobiGapBelowL1'>): number[] {
  return jacobiGridLevels({ jacobiL1: bounds.l1, lowest, gapBelowL1: search.jacobiGapBelowL1, count: search.jacobiLevels });
}

/**
 * Screenings of stable members, all on. 200 returns per hold-radius trial (the definition's N; the
 * core's criterion is tuned for it); 4 members besides each window's middle; 12 synodic months and 8
 * phases for the Sun and the eccentricity. The demo with these runs in a few minutes (bench/beyond-demo.ts).
 */
export const DEFAULT_SCREENING: ScreeningSettings = {
  holdRadius: { enabled: true, returns: 200, membersPerWindow: 4 },
  sun: { enabled: true, spanSynodicMonths: 12, phases: 8 },
  eccentricity: { enabled: true, spanSynodicMonths: 12, phases: 8 },
};
