// Built-in settings used where the config (or the one-family command line) leaves them out.
// Rough first values, meant to be tuned: modest enough that the demo runs in minutes.
import type { AxisSegment, FamilyLimits, ScreeningSettings } from '../core/orbits/family-job.ts';
import type { SystemJacobiBounds } from './system-jacobi-bounds.ts';

export const DEFAULT_TOLERANCE = { rtol: 1e-12, atol: 1e-12 } as const;

/** Stable-window edges located to this accuracy in ν. */
export const DEFAULT_INDEX_TOLERANCE = 1e-6;

export const ALL_SEGMENTS: readonly AxisSegment[] = ['far-primary', 'between', 'far-secondary'];

export interface SearchSettings {
  segments: AxisSegment[];
  directions: Array<1 | -1>;
  maxHalfCrossings: number;
  gridPoints: number;
}

export const DEFAULT_SEARCH: SearchSettings = {
  segments: [...ALL_SEGMENTS],
  directions: [1, -1],
  maxHalfCrossings: 6,
  gridPoints: 120,
};

/** The limits that do not depend on the system (the Jacobi range does; see defaultJacobiLimits). */
export type SystemFreeLimits = Omit<FamilyLimits, 'jacobiMin' | 'jacobiMax'>;

export const DEFAULT_LIMITS: SystemFreeLimits = {
  maxMembers: 150,
  maxPeriodNd: 40,
  unstableStop: { indexAbove: 1000, members: 30 },
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

/** Four scan levels evenly inside (C(L3), C(L1)), rounded to 1e-4 (still strictly inside). */
export function defaultJacobiValues(bounds: SystemJacobiBounds): number[] {
  return [0.2, 0.4, 0.6, 0.8].map((f) => Math.round((bounds.l3 + f * (bounds.l1 - bounds.l3)) * 1e4) / 1e4);
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
