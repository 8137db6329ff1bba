// The mass ratio μ of a command: either --mu directly or a system preset by id (system-presets.ts).
import { massRatioOf, SYSTEM_PRESETS, type SystemPreset } from '../core/cr3bp/system-presets.ts';
import { UsageError } from '../errors/usage-error.ts';
import { parseNumberInRange, type NumberRange } from './parse-number.ts';

/** μ = m₂ / (m₁ + m₂) with m₂ the smaller primary: (0, 0.5] (common practice). */
export const MASS_RATIO_RANGE: NumberRange = { min: 0, max: 0.5, minOpen: true };

export interface MassRatioChoice {
  mu: number;
  /** The preset named by --system, or null when --mu was given. */
  system: SystemPreset | null;
}

export function parseMassRatio(flags: { mu?: string; system?: string }): MassRatioChoice {
  const systemIds = SYSTEM_PRESETS.map((p) => p.id).join(', ');
  if (flags.mu !== undefined && flags.system !== undefined) {
    throw new UsageError('--mu: give either --mu or --system, not both');
  }
  if (flags.system !== undefined) {
    const system = SYSTEM_PRESETS.find((p) => p.id === flags.system);
    if (!system) throw new UsageError(`--system: "${flags.system}" is not a known system (allowed: ${systemIds})`);
    return { mu: massRatioOf(system), system };
  }
  if (flags.mu === undefined) {
    throw new UsageError(`--mu: missing (a mass ratio in (0, 0.5], or --system with one of ${systemIds})`);
  }
  return { mu: parseNumberInRange('--mu', flags.mu, MASS_RATIO_RANGE), system: null };
}
