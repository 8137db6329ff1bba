// The catalog config (YAML) as a strict zod schema: unknown keys are rejected, every number has a
// range, and each error message names the value and the allowed range. Checks that depend on the
// system (Jacobi ranges, signature letters, ...) run afterwards in check-config-semantics.ts, once
// the structure is sound. catalogs/catalog-config.schema.json is generated from this file.
import { z } from 'zod';
import { SYSTEM_PRESETS } from '../core/cr3bp/system-presets.ts';
import { count, list, oneOf, ruledNumber, strictObject, text } from './config-rules.ts';
import { DEFAULT_INDEX_TOLERANCE, DEFAULT_TOLERANCE } from './default-settings.ts';
import { formatValue } from './format-value.ts';
import { screeningSchema } from './screening-schema.ts';

/** Largest n and m of a lap signature E{n}M{m} the generator is asked to search. */
export const MAX_SIGNATURE_LAPS = 20;

const tolerance = ruledNumber({ min: 0, max: 1e-6, minOpen: true, note: 'integration tolerance' });
const positive = (max: number, note?: string) => ruledNumber({ min: 0, max, minOpen: true, note });
/** Checked against the system's equilibria later; here only "a number". */
const jacobiValue = ruledNumber({ min: 0, max: 100, minOpen: true, maxOpen: true, note: 'a Jacobi constant' });

const presetIds = SYSTEM_PRESETS.map((p) => p.id) as [string, ...string[]];

const systemId = z
  .string({ error: (iss) => (iss.input === undefined ? 'is missing (a system id)' : `${formatValue(iss.input)} is not text (a system id)`) })
  .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, { error: (iss) => `${formatValue(iss.input)} is not a system id (lower-case letters, digits and single dashes, e.g. earth-moon)` });

const bodyLetter = z
  .string({ error: (iss) => `${formatValue(iss.input)} is not a letter (one capital letter A–Z)` })
  .regex(/^[A-Z]$/, { error: (iss) => `${formatValue(iss.input)} is not allowed (one capital letter A–Z)` });

export const systemEntrySchema = strictObject(
  {
    preset: oneOf(presetIds),
    /** A new id is needed when physical values are overridden and the preset's own system is also wanted. */
    id: systemId.optional(),
    name: text('display name', 80).optional(),
    primaryName: text('body name', 40).optional(),
    secondaryName: text('body name', 40).optional(),
    primaryLetter: bodyLetter.optional(),
    secondaryLetter: bodyLetter.optional(),
    primaryGmKm3S2: positive(1e12, 'km³/s²').optional(),
    secondaryGmKm3S2: positive(1e12, 'km³/s²').optional(),
    lengthUnitKm: positive(1e10, 'km').optional(),
    primaryRadiusKm: positive(1e7, 'km').optional(),
    secondaryRadiusKm: positive(1e7, 'km').optional(),
    synodicPeriodDays: positive(1e5, 'days').nullable().optional(),
    source: text('where the constants come from', 500).optional(),
  },
  'a system: preset plus optional overrides',
);

export const limitsSchema = strictObject(
  {
    maxMembers: count(100_000).optional(),
    jacobiMin: jacobiValue.optional(),
    jacobiMax: jacobiValue.optional(),
    maxPeriodNd: positive(1000, 'nondimensional time').optional(),
    unstableStop: strictObject(
      {
        indexAbove: ruledNumber({ min: 1, max: 1e15, note: '|ν| above 1 is unstable' }),
        members: count(10_000),
      },
      'indexAbove and members',
    ).optional(),
    initialStepNd: positive(1, 'nondimensional arclength').optional(),
    maxStepNd: positive(1, 'nondimensional arclength').optional(),
  },
  'continuation limits',
);

const segment = oneOf(['far-primary', 'between', 'far-secondary']);
const direction = z.literal([1, -1], { error: (iss) => `${formatValue(iss.input)} is not allowed (allowed: 1, -1)` });

const searchFields = {
  segments: list(segment, 1, 3, 'axis segments to seed on').optional(),
  directions: list(direction, 1, 2, 'start directions of ẏ: 1, -1').optional(),
  maxHalfCrossings: count(64).optional(),
  gridPoints: count(100_000, 2).optional(),
  jacobiLevels: count(2_000, 2).optional(),
  jacobiLowest: jacobiValue.optional(),
  jacobiGapBelowL1: ruledNumber({ min: 1e-9, max: 1, note: 'C(L1) − C of the highest grid level' }).optional(),
};

export const searchSchema = strictObject(
  { ...searchFields, jacobi: list(jacobiValue, 1, 2_000, 'Jacobi levels of the grid (overrides jacobiLevels)').optional() },
  'search settings',
);

const familyCommon = {
  system: systemId,
  name: text('display name', 120).optional(),
  limits: limitsSchema.optional(),
  /** Overrides the top-level screening settings for this family, key by key. */
  screening: screeningSchema.optional(),
};

export const signatureFamilySchema = strictObject(
  {
    ...familyCommon,
    signature: text('a lap signature such as E2M1', 12),
    jacobi: list(jacobiValue, 1, 2_000, 'Jacobi levels of the grid (overrides jacobiLevels)').optional(),
    ...searchFields,
  },
  'a lap-signature family',
);

export const lyapunovFamilySchema = strictObject(
  {
    ...familyCommon,
    lyapunov: oneOf(['L1', 'L2']),
    amplitudeNd: positive(0.2, 'nondimensional x-amplitude of the first member').optional(),
  },
  'a Lyapunov family',
);

export const retrogradeFamilySchema = strictObject(
  {
    ...familyCommon,
    retrograde: strictObject({ distanceKm: positive(1e10, 'km from the smaller body') }, 'distanceKm'),
  },
  'a retrograde family',
);

/** Which key tells the three kinds of family entry apart (used to explain union errors). */
export const FAMILY_KIND_KEYS = ['signature', 'lyapunov', 'retrograde'] as const;

export const familyEntrySchema = z.union([signatureFamilySchema, lyapunovFamilySchema, retrogradeFamilySchema]);

export const catalogConfigShape = strictObject(
  {
    scenario: strictObject(
      {
        name: text('scenario name', 120),
        team: text('team name', 120),
        description: text('one paragraph', 2000),
      },
      'name, team and description',
    ),
    systems: list(systemEntrySchema, 1, 20, 'systems used by the families'),
    tolerance: strictObject({ rtol: tolerance, atol: tolerance }, 'rtol and atol').default({ ...DEFAULT_TOLERANCE }),
    indexTolerance: ruledNumber({ min: 0, max: 1e-2, minOpen: true, note: 'accuracy of stable-window edges in ν' }).default(
      DEFAULT_INDEX_TOLERANCE,
    ),
    defaults: strictObject(
      { limits: limitsSchema.optional(), search: searchSchema.optional() },
      'limits and search settings for every family',
    ).optional(),
    /** Screenings of stable members for every family (on by default: see DEFAULT_SCREENING). */
    screening: screeningSchema.optional(),
    families: list(familyEntrySchema, 1, 500, 'families to generate'),
  },
  'a catalog config',
);

export type CatalogConfig = z.output<typeof catalogConfigShape>;
export type SystemEntry = z.output<typeof systemEntrySchema>;
export type FamilyEntry = z.output<typeof familyEntrySchema>;
export type LimitsEntry = z.output<typeof limitsSchema>;
