// A config system entry (preset plus overrides) as the SystemSpec the numerics and the catalog use.
import type { SystemSpec } from '../core/orbits/family-job.ts';
import { findSystemPreset, massRatioOf, timeUnitSecondsOf } from '../core/cr3bp/system-presets.ts';
import type { SystemEntry } from './config-schema.ts';

/** Overrides that change the physics: the source text then says so. */
const PHYSICAL_FIELDS = ['primaryGmKm3S2', 'secondaryGmKm3S2', 'lengthUnitKm', 'primaryRadiusKm', 'secondaryRadiusKm', 'synodicPeriodDays'] as const;

export function resolveSystem(entry: SystemEntry): SystemSpec {
  const { preset: presetId, id, source, ...overrides } = entry;
  const defined = Object.fromEntries(Object.entries(overrides).filter(([, v]) => v !== undefined));
  const preset = { ...findSystemPreset(presetId), ...defined };
  const changed = PHYSICAL_FIELDS.filter((field) => field in defined);
  const note = changed.length > 0 ? `; overridden in the config: ${changed.join(', ')}` : '';
  return {
    id: id ?? preset.id,
    name: preset.name,
    mu: massRatioOf(preset),
    lengthUnitKm: preset.lengthUnitKm,
    timeUnitS: timeUnitSecondsOf(preset),
    primaryName: preset.primaryName,
    secondaryName: preset.secondaryName,
    primaryLetter: preset.primaryLetter,
    secondaryLetter: preset.secondaryLetter,
    primaryRadiusKm: preset.primaryRadiusKm,
    secondaryRadiusKm: preset.secondaryRadiusKm,
    synodicPeriodDays: preset.synodicPeriodDays,
    source: source ?? `${preset.source}${note}`,
  };
}
