// The fields of a system that its stored results depend on: the physics (μ, units, radii, synodic
// month) and the lap-signature letters. Names and the source text are display only.
import type { SystemRow } from './types.ts';

export const SYSTEM_CONSTANT_FIELDS = [
  'mu',
  'lengthUnitKm',
  'timeUnitS',
  'primaryRadiusKm',
  'secondaryRadiusKm',
  'synodicPeriodDays',
  'primaryLetter',
  'secondaryLetter',
] as const satisfies ReadonlyArray<keyof SystemRow>;

export type SystemConstantField = (typeof SYSTEM_CONSTANT_FIELDS)[number];

/** The first constant in which two descriptions of one system differ, or null. */
export function firstSystemConstantDifference(
  stored: Pick<SystemRow, SystemConstantField>,
  given: Pick<SystemRow, SystemConstantField>,
): SystemConstantField | null {
  return SYSTEM_CONSTANT_FIELDS.find((field) => !Object.is(stored[field], given[field])) ?? null;
}
