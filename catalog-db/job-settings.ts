// The settings stored with each done job (jobs.settings): how they are written and how two sets of
// settings are compared. One source for generate (a changed config) and merge (inputs from other configs).
import type { JobWithSettings } from './types.ts';

/** JSON of the whole job object; NaN and ±Infinity become null as in any JSON, on both sides of a comparison. */
export function jobSettingsJson(job: JobWithSettings, where: string): string {
  if (typeof job !== 'object' || job === null || typeof job.key !== 'string' || job.key === '') {
    throw new Error(`${where}: the job's key must be a non-empty string`);
  }
  return JSON.stringify(job);
}

/** The first field (dotted path, e.g. "system.mu" or "seed.jacobiValues[2]") where two settings differ. */
export interface SettingDifference {
  path: string;
  stored: unknown;
  given: unknown;
}

/** Fields of a job that only name things (shown on the site, never used in a computation). */
const DISPLAY_ONLY_PATHS = new Set(['name', 'system.name', 'system.source', 'system.primaryName', 'system.secondaryName']);

/** Compares the JSON forms (so a value that JSON cannot hold compares as JSON stores it), skipping the
 *  display-only fields; null when every setting the results depend on is equal. */
export function firstSettingDifference(stored: unknown, given: unknown): SettingDifference | null {
  return firstDifference(asJson(stored), asJson(given), '');
}

/** "mu (0.0121505842695 → 0.01215)": the field's path and both values, the stored one first. */
export function formatSettingDifference(difference: SettingDifference): string {
  return `${difference.path === '' ? 'settings' : difference.path} (${showValue(difference.stored)} → ${showValue(difference.given)})`;
}

function asJson(value: unknown): unknown {
  return value === undefined ? undefined : JSON.parse(JSON.stringify(value));
}

function firstDifference(a: unknown, b: unknown, path: string): SettingDifference | null {
  if (Array.isArray(a) && Array.isArray(b)) {
    for (let i = 0; i < Math.max(a.length, b.length); i++) {
      const found = firstDifference(a[i], b[i], `${path}[${i}]`);
      if (found) return found;
    }
    return null;
  }
  if (isPlainObject(a) && isPlainObject(b)) {
    const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])];
    for (const key of keys) {
      if (DISPLAY_ONLY_PATHS.has(path === '' ? key : `${path}.${key}`)) continue;
      const found = firstDifference(a[key], b[key], path === '' ? key : `${path}.${key}`);
      if (found) return found;
    }
    return null;
  }
  return Object.is(a, b) ? null : { path, stored: a, given: b };
}

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function showValue(value: unknown): string {
  if (value === undefined) return 'absent';
  const text = JSON.stringify(value);
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}
