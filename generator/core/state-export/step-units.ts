// The sample step of a state export: a duration in s, min, h or d, or in the model's time unit (tu).

export const STEP_UNITS = ['s', 'min', 'h', 'd', 'tu'] as const;
export type StepUnit = (typeof STEP_UNITS)[number];

const SECONDS_PER: Record<Exclude<StepUnit, 'tu'>, number> = { s: 1, min: 60, h: 3600, d: 86400 };

/** The step in seconds; a step in tu counts the catalog's mean time unit. */
export function stepSeconds(value: number, unit: StepUnit, timeUnitS: number): number {
  return unit === 'tu' ? value * timeUnitS : value * SECONDS_PER[unit];
}
