// Checks that need more than one field or the system's physics: they run once the structure has
// passed the schema, and return the first problem found (in file order), or null.
import type { SystemSpec } from '../core/orbits/family-job.ts';
import type { CatalogConfig, FamilyEntry } from './config-schema.ts';
import { MAX_SIGNATURE_LAPS } from './config-schema.ts';
import type { ConfigIssue, ConfigPath } from './config-path.ts';
import { formatConfigPath } from './config-path.ts';
import { familyKeyOf, resolveLimits, resolveSearch, type Sourced } from './family-settings.ts';
import { formatNumber, formatRange, formatValue } from './format-value.ts';
import { parseConfigSignature } from './config-lap-signature.ts';
import { resolveSystem } from './resolve-system.ts';
import { checkSystemPhysics } from './check-system-physics.ts';
import { systemJacobiBounds, type SystemJacobiBounds } from './system-jacobi-bounds.ts';
import { DEFAULT_SEARCH, defaultJacobiLimits } from './default-settings.ts';

export function checkConfigSemantics(config: CatalogConfig): ConfigIssue | null {
  const systems = new Map<string, { spec: SystemSpec; bounds: SystemJacobiBounds }>();
  for (const [index, entry] of config.systems.entries()) {
    const spec = resolveSystem(entry);
    if (systems.has(spec.id)) {
      return { path: ['systems', index], message: `${formatValue(spec.id)} is listed twice (give the second an id of its own)` };
    }
    if (spec.primaryLetter === spec.secondaryLetter) {
      return {
        path: ['systems', index, entry.secondaryLetter !== undefined ? 'secondaryLetter' : 'primaryLetter'],
        message: `${formatValue(spec.secondaryLetter)} is the letter of both bodies of ${spec.id} (lap signatures need two different letters)`,
      };
    }
    const physicsIssue = checkSystemPhysics(entry, index, spec);
    if (physicsIssue) return physicsIssue;
    systems.set(spec.id, { spec, bounds: systemJacobiBounds(spec.mu) });
  }

  const keys = new Map<string, number>();
  for (const [index, entry] of config.families.entries()) {
    const at = (...rest: PropertyKey[]): ConfigPath => ['families', index, ...rest];
    const system = systems.get(entry.system);
    if (system === undefined) {
      return { path: at('system'), message: `${formatValue(entry.system)} is not one of the configured systems (${[...systems.keys()].join(', ')})` };
    }
    const key = familyKeyOf(entry);
    const earlier = keys.get(key);
    if (earlier !== undefined) {
      return { path: at(), message: `repeats families[${earlier}] (both are ${key}; merge their settings into one entry)` };
    }
    keys.set(key, index);
    const issue = checkFamily(config, index, entry, system.spec, system.bounds);
    if (issue) return issue;
  }
  return null;
}

function checkFamily(config: CatalogConfig, index: number, entry: FamilyEntry, spec: SystemSpec, bounds: SystemJacobiBounds): ConfigIssue | null {
  const at = (...rest: PropertyKey[]): ConfigPath => ['families', index, ...rest];
  if ('signature' in entry) {
    if (parseConfigSignature(entry.signature, spec.primaryLetter, spec.secondaryLetter, MAX_SIGNATURE_LAPS) === null) {
      const p = spec.primaryLetter;
      const s = spec.secondaryLetter;
      return {
        path: at('signature'),
        message: `${formatValue(entry.signature)} is not a lap signature ${p}<n>${s}<m> for ${spec.id} (n and m integers from 1 to ${MAX_SIGNATURE_LAPS}, e.g. ${p}2${s}1)`,
      };
    }
    const lowestIssue = checkGridLowest(config, index, entry, bounds);
    if (lowestIssue) return lowestIssue;
    const search = resolveSearch(config, index, bounds);
    const jacobiIssue = checkScanLevels(search.jacobi, spec.id, bounds);
    if (jacobiIssue) return jacobiIssue;
    for (const [field, values] of [['segments', search.segments], ['directions', search.directions]] as const) {
      const repeated = (values as readonly unknown[]).find((v, i) => values.indexOf(v as never) !== i);
      if (repeated !== undefined) {
        const path = 'signature' in entry && entry[field] !== undefined ? at(field) : ['defaults', 'search', field];
        return { path, message: `${formatValue(repeated)} is listed twice (each value at most once)` };
      }
    }
  }
  if ('retrograde' in entry) {
    const minKm = spec.secondaryRadiusKm;
    const maxKm = 0.5 * spec.lengthUnitKm;
    const km = entry.retrograde.distanceKm;
    if (!(km > minKm && km < maxKm)) {
      return {
        path: at('retrograde', 'distanceKm'),
        message: `${formatNumber(km)} is outside the allowed range ${formatRange(minKm, maxKm, true, true)} for ${spec.id} (km from the ${spec.secondaryName}'s centre: above its radius, below half the primaries' distance)`,
      };
    }
  }
  const limits = resolveLimits(config, index, bounds);
  const orderIssue =
    checkOrder(limits.jacobiMin, limits.jacobiMax, 'jacobiMin', 'jacobiMax', spec.id, true) ??
    checkOrder(limits.initialStepNd, limits.maxStepNd, 'initialStepNd', 'maxStepNd', spec.id, false);
  if (orderIssue) return { ...orderIssue, path: orderIssue.path.length > 0 ? orderIssue.path : at('limits') };
  return null;
}

/** The lowest grid level must lie below the highest, C(L1) − gap. */
function checkGridLowest(config: CatalogConfig, index: number, entry: FamilyEntry, bounds: SystemJacobiBounds): ConfigIssue | null {
  if (!('signature' in entry)) return null;
  const shared = config.defaults?.search ?? {};
  const gap = entry.jacobiGapBelowL1 ?? shared.jacobiGapBelowL1 ?? DEFAULT_SEARCH.jacobiGapBelowL1;
  const [lowest, path]: [number, ConfigPath] = entry.jacobiLowest !== undefined
    ? [entry.jacobiLowest, ['families', index, 'jacobiLowest']]
    : shared.jacobiLowest !== undefined
      ? [shared.jacobiLowest, ['defaults', 'search', 'jacobiLowest']]
      : [resolveLimits(config, index, bounds).limits.jacobiMin, ['families', index, 'limits', 'jacobiMin']];
  const floor = defaultJacobiLimits('lap-signature', bounds).jacobiMin;
  if (lowest >= floor && lowest < bounds.l1 - gap) return null;
  return {
    path,
    message: `${formatNumber(lowest)} is outside the allowed range ${formatRange(floor, bounds.l1 - gap, false, true, 5)} for the lowest discovery level (from C(L4) − 1 to C(L1) − jacobiGapBelowL1)`,
  };
}

function checkScanLevels(jacobi: Sourced<number[]>, systemId: string, bounds: SystemJacobiBounds): ConfigIssue | null {
  const floor = defaultJacobiLimits('lap-signature', bounds).jacobiMin;
  for (const [i, value] of jacobi.value.entries()) {
    if (!(value >= floor && value < bounds.l1)) {
      return {
        path: [...(jacobi.path ?? ['jacobi']), i],
        message: `${formatNumber(value)} is outside the allowed range ${formatRange(floor, bounds.l1, false, true, 5)} for ${systemId} (from C(L4) − 1 up to the L1 Jacobi constant)`,
      };
    }
  }
  return null;
}

/** low must stay below high (or at most equal, for step sizes); the message names whichever was set. */
function checkOrder(
  low: Sourced<number>,
  high: Sourced<number>,
  lowName: string,
  highName: string,
  systemId: string,
  strict: boolean,
): ConfigIssue | null {
  if (strict ? low.value < high.value : low.value <= high.value) return null;
  const origin = (s: Sourced<number>) => (s.path === null ? `built-in default for ${systemId}` : formatConfigPath(s.path));
  // Report at the value the user wrote most specifically (family entry, then defaults); on a tie the lower one.
  const rank = (s: Sourced<number>) => (s.path === null ? 0 : s.path[0] === 'families' ? 2 : 1);
  const blamed = rank(low) >= rank(high) ? low : high;
  const relation = strict ? 'below' : 'at most';
  const message =
    blamed === low
      ? `${formatNumber(low.value)} must be ${relation} ${highName} ${formatNumber(high.value)} (${origin(high)})`
      : `${formatNumber(high.value)} must be ${strict ? 'above' : 'at least'} ${lowName} ${formatNumber(low.value)} (${origin(low)})`;
  return { path: blamed.path ?? [], message };
}
