// Checks that a family bundle hangs together before any of it is written: rows filed under another
// family would survive the next replacement of this one, and wrong counts would mislead the site.
import type { FamilyBundle } from './types.ts';

export function assertBundleConsistent(bundle: FamilyBundle): void {
  const { family, orbits, stableWindows, bifurcations } = bundle;
  if (family === null || typeof family !== 'object' || typeof family.id !== 'string' || family.id === '') {
    throw new Error('family bundle: family.id must be a non-empty string');
  }
  for (const [label, rows] of [
    ['orbit', orbits],
    ['stable window', stableWindows],
    ['bifurcation', bifurcations],
  ] as const) {
    if (!Array.isArray(rows)) throw new Error(`family ${family.id}: ${label} rows must be an array`);
    for (const row of rows) {
      if (row.familyId !== family.id) {
        throw new Error(`${label} ${row.id}: familyId must be ${family.id} (the bundle's family), got ${row.familyId}`);
      }
    }
  }
  if (family.memberCount !== orbits.length) {
    throw new Error(`family ${family.id}: memberCount must equal the ${orbits.length} orbits given, got ${family.memberCount}`);
  }
  if (family.stableWindowCount !== stableWindows.length) {
    throw new Error(
      `family ${family.id}: stableWindowCount must equal the ${stableWindows.length} stable windows given, got ${family.stableWindowCount}`,
    );
  }
  const orbitIds = new Set(orbits.map((orbit) => orbit.id));
  for (const window of stableWindows) {
    if (!orbitIds.has(window.midOrbitId)) {
      throw new Error(`stable window ${window.id}: midOrbitId must be one of the family's orbits, got ${window.midOrbitId}`);
    }
  }
}
