// What a family entry asks for once the config's defaults and the built-in defaults are filled in,
// remembering where each value came from so that a bad combination is reported at the right place.
import type { FamilyLimits, ScreeningSettings } from '../core/orbits/family-job.ts';
import type { CatalogConfig, FamilyEntry } from './config-schema.ts';
import type { ConfigPath } from './config-path.ts';
import {
  DEFAULT_LIMITS,
  DEFAULT_LYAPUNOV_AMPLITUDE_ND,
  DEFAULT_SCREENING,
  DEFAULT_SEARCH,
  defaultJacobiLimits,
  defaultJacobiValues,
  type FamilyEntryKind,
  type SearchSettings,
} from './default-settings.ts';
import type { SystemJacobiBounds } from './system-jacobi-bounds.ts';

export function familyKindOf(entry: FamilyEntry): FamilyEntryKind {
  if ('signature' in entry) return 'lap-signature';
  if ('lyapunov' in entry) return 'lyapunov';
  return 'retrograde';
}

/** Stable key of a family entry; resume skips finished keys, so it must not depend on list order. */
export function familyKeyOf(entry: FamilyEntry): string {
  if ('signature' in entry) return `${entry.system}:${entry.signature}`;
  if ('lyapunov' in entry) return `${entry.system}:${entry.lyapunov}-lyapunov`;
  return `${entry.system}:retrograde-${entry.retrograde.distanceKm}km`;
}

export function familyNameOf(entry: FamilyEntry): string {
  if (entry.name !== undefined) return entry.name;
  if ('signature' in entry) return entry.signature;
  if ('lyapunov' in entry) return `${entry.lyapunov} Lyapunov`;
  return `Retrograde at ${entry.retrograde.distanceKm} km`;
}

/** A value and the config path it came from (null: built-in default). */
export interface Sourced<T> {
  value: T;
  path: ConfigPath | null;
}

function pick<T>(candidates: Array<[T | undefined, ConfigPath]>, fallback: T): Sourced<T> {
  for (const [value, path] of candidates) if (value !== undefined) return { value, path };
  return { value: fallback, path: null };
}

export interface ResolvedLimits {
  limits: FamilyLimits;
  jacobiMin: Sourced<number>;
  jacobiMax: Sourced<number>;
  initialStepNd: Sourced<number>;
  maxStepNd: Sourced<number>;
}

export function resolveLimits(config: CatalogConfig, index: number, bounds: SystemJacobiBounds): ResolvedLimits {
  const entry = config.families[index] as FamilyEntry;
  const own = entry.limits ?? {};
  const shared = config.defaults?.limits ?? {};
  const at = (key: string): Array<ConfigPath> => [['families', index, 'limits', key], ['defaults', 'limits', key]];
  const choose = <K extends keyof typeof own>(key: K, fallback: NonNullable<(typeof own)[K]>) => {
    const [ownPath, sharedPath] = at(key as string) as [ConfigPath, ConfigPath];
    return pick<NonNullable<(typeof own)[K]>>(
      [
        [own[key] ?? undefined, ownPath],
        [shared[key] ?? undefined, sharedPath],
      ],
      fallback,
    );
  };
  const jacobiDefaults = defaultJacobiLimits(familyKindOf(entry), bounds);
  const jacobiMin = choose('jacobiMin', jacobiDefaults.jacobiMin);
  const jacobiMax = choose('jacobiMax', jacobiDefaults.jacobiMax);
  const initialStepNd = choose('initialStepNd', DEFAULT_LIMITS.initialStepNd);
  const maxStepNd = choose('maxStepNd', DEFAULT_LIMITS.maxStepNd);
  return {
    limits: {
      maxMembers: choose('maxMembers', DEFAULT_LIMITS.maxMembers).value,
      jacobiMin: jacobiMin.value,
      jacobiMax: jacobiMax.value,
      maxPeriodNd: choose('maxPeriodNd', DEFAULT_LIMITS.maxPeriodNd).value,
      unstableStop: choose('unstableStop', DEFAULT_LIMITS.unstableStop as NonNullable<(typeof own)['unstableStop']>).value ?? null,
      initialStepNd: initialStepNd.value,
      maxStepNd: maxStepNd.value,
    },
    jacobiMin,
    jacobiMax,
    initialStepNd,
    maxStepNd,
  };
}

export interface ResolvedSearch extends SearchSettings {
  jacobi: Sourced<number[]>;
}

/** Search settings of a lap-signature entry: its own, else the config's defaults, else built-in ones. */
export function resolveSearch(config: CatalogConfig, index: number, bounds: SystemJacobiBounds): ResolvedSearch {
  const entry = config.families[index] as FamilyEntry;
  const own: Partial<SearchSettings> & { jacobi?: number[]; jacobiLowest?: number } =
    'signature' in entry
      ? {
        segments: entry.segments, directions: entry.directions, maxHalfCrossings: entry.maxHalfCrossings, gridPoints: entry.gridPoints,
        jacobi: entry.jacobi, jacobiLevels: entry.jacobiLevels, jacobiLowest: entry.jacobiLowest, jacobiGapBelowL1: entry.jacobiGapBelowL1,
      }
      : {};
  const shared = config.defaults?.search ?? {};
  const value = <K extends keyof SearchSettings>(key: K): SearchSettings[K] =>
    (own[key] ?? shared[key] ?? DEFAULT_SEARCH[key]) as SearchSettings[K];
  return {
    segments: [...value('segments')],
    directions: [...value('directions')],
    maxHalfCrossings: value('maxHalfCrossings'),
    gridPoints: value('gridPoints'),
    jacobiLevels: value('jacobiLevels'),
    jacobiGapBelowL1: value('jacobiGapBelowL1'),
    jacobi: pick<number[]>(
      [
        [own.jacobi, ['families', index, 'jacobi']],
        [shared.jacobi, ['defaults', 'search', 'jacobi']],
      ],
      defaultJacobiValues(bounds, own.jacobiLowest ?? shared.jacobiLowest ?? resolveLimits(config, index, bounds).limits.jacobiMin, {
        jacobiLevels: value('jacobiLevels'), jacobiGapBelowL1: value('jacobiGapBelowL1'),
      }),
    ),
  };
}

export function lyapunovAmplitudeNd(entry: FamilyEntry): number {
  return 'lyapunov' in entry ? (entry.amplitudeNd ?? DEFAULT_LYAPUNOV_AMPLITUDE_ND) : Number.NaN;
}

/** Screening settings of a family entry, key by key: its own, else the top-level ones, else built-in. */
export function resolveScreening(config: CatalogConfig, index: number): ScreeningSettings {
  const own = (config.families[index] as FamilyEntry).screening ?? {};
  const shared = config.screening ?? {};
  const part = <K extends keyof ScreeningSettings>(key: K): ScreeningSettings[K] =>
    ({ ...DEFAULT_SCREENING[key], ...definedOnly(shared[key]), ...definedOnly(own[key]) }) as ScreeningSettings[K];
  return { holdRadius: part('holdRadius'), sun: part('sun'), eccentricity: part('eccentricity') };
}

function definedOnly<T extends object>(values: T | undefined): Partial<T> {
  return Object.fromEntries(Object.entries(values ?? {}).filter(([, value]) => value !== undefined)) as Partial<T>;
}
