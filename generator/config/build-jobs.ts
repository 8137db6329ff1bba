// One FamilyJob per family entry of a validated config, in config order (shards and resume rely on
// that order and on the stable keys, e.g. "earth-moon:E2M1", "earth-moon:L1-lyapunov").
import type { FamilyJob, SeedRule, SystemSpec } from '../core/orbits/family-job.ts';
import type { CatalogConfig } from './config-schema.ts';
import { familyKeyOf, familyNameOf, lyapunovAmplitudeNd, resolveLimits, resolveScreening, resolveSearch } from './family-settings.ts';
import { resolveSystem } from './resolve-system.ts';
import { systemJacobiBounds } from './system-jacobi-bounds.ts';
import { ConfigError } from './validate-config.ts';

/** configPath only names the config in error messages (the config must have passed validateConfig). */
export function buildJobs(config: CatalogConfig, configPath: string): FamilyJob[] {
  const systems = new Map(config.systems.map((entry) => {
    const spec = resolveSystem(entry);
    return [spec.id, spec] as const;
  }));
  return config.families.map((entry, index): FamilyJob => {
    const system = systems.get(entry.system);
    if (system === undefined) {
      throw new ConfigError(`config ${configPath}: families[${index}].system: "${entry.system}" is not one of the configured systems`);
    }
    const bounds = systemJacobiBounds(system.mu);
    return {
      key: familyKeyOf(entry),
      name: familyNameOf(entry),
      system,
      seed: seedRuleOf(config, index, system),
      limits: resolveLimits(config, index, bounds).limits,
      tolerance: { rtol: config.tolerance.rtol, atol: config.tolerance.atol },
      indexTolerance: config.indexTolerance,
      screening: resolveScreening(config, index),
    };
  });
}

function seedRuleOf(config: CatalogConfig, index: number, system: SystemSpec): SeedRule {
  const entry = config.families[index]!;
  if ('signature' in entry) {
    const search = resolveSearch(config, index, systemJacobiBounds(system.mu));
    return {
      kind: 'lap-signature',
      signature: entry.signature,
      jacobiValues: [...search.jacobi.value],
      segments: search.segments,
      directions: search.directions,
      maxHalfCrossings: search.maxHalfCrossings,
      gridPoints: search.gridPoints,
    };
  }
  if ('lyapunov' in entry) return { kind: 'lyapunov', point: entry.lyapunov, amplitudeNd: lyapunovAmplitudeNd(entry) };
  return { kind: 'retrograde', distanceNd: entry.retrograde.distanceKm / system.lengthUnitKm };
}

/** The systems of a config, as rows for the catalog. */
export function configSystems(config: CatalogConfig): SystemSpec[] {
  return config.systems.map(resolveSystem);
}
