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
  assertScreeningsConsistent(bundle, orbitIds);
}

/** Hold radii and model screenings (optional): each names one of the bundle's orbits, at most once (per model). */
function assertScreeningsConsistent(bundle: FamilyBundle, orbitIds: ReadonlySet<string>): void {
  const { family, holdRadii, modelScreenings } = bundle;
  for (const [label, rows] of [
    ['holdRadii', holdRadii],
    ['modelScreenings', modelScreenings],
  ] as const) {
    if (rows !== undefined && !Array.isArray(rows)) throw new Error(`family ${family.id}: ${label} must be an array when given`);
  }
  const seen = new Set<string>();
  for (const row of holdRadii ?? []) {
    const where = `hold radius ${row.orbitId}`;
    checkOwner(where, row, family.id, orbitIds);
    if (seen.has(row.orbitId)) throw new Error(`${where}: orbitId must appear once among the hold radii, got it twice`);
    seen.add(row.orbitId);
    if (!(row.holdRadiusKm >= 0)) throw new Error(`${where}: holdRadiusKm must be ≥ 0, got ${row.holdRadiusKm}`);
    if (row.failingDisplacementKm !== null && !(row.failingDisplacementKm >= row.holdRadiusKm)) {
      throw new Error(`${where}: failingDisplacementKm must be null or ≥ holdRadiusKm ${row.holdRadiusKm}, got ${row.failingDisplacementKm}`);
    }
    if (!Number.isSafeInteger(row.returns) || row.returns < 1) throw new Error(`${where}: returns must be a positive integer, got ${row.returns}`);
    if (!Array.isArray(row.curveX) || !Array.isArray(row.curveVx) || row.curveX.length !== row.curveVx.length) {
      throw new Error(`${where}: curveX and curveVx must be arrays of the same length`);
    }
  }
  seen.clear();
  for (const row of modelScreenings ?? []) {
    const where = `model screening ${row.orbitId} ${row.model}`;
    checkOwner(where, row, family.id, orbitIds);
    if (row.model !== 'bicircular' && row.model !== 'elliptic') {
      throw new Error(`${where}: model must be bicircular or elliptic, got ${String(row.model)}`);
    }
    const key = `${row.orbitId}\u0000${row.model}`;
    if (seen.has(key)) throw new Error(`${where}: orbitId and model must appear once among the model screenings, got them twice`);
    seen.add(key);
    if (!Number.isSafeInteger(row.phases) || row.phases < 1) throw new Error(`${where}: phases must be a positive integer, got ${row.phases}`);
    for (const field of ['firstBrokenPeriods', 'phaseRad', 'maxDepartureKm'] as const) {
      const list = row[field];
      if (!Array.isArray(list) || list.length !== row.phases) {
        throw new Error(`${where}: ${field} must list one value per phase (${row.phases}), got ${Array.isArray(list) ? list.length : typeof list}`);
      }
    }
    // The fraction must say what the per-phase list says (a phase survives when it has no broken period).
    const surviving = row.firstBrokenPeriods.filter((period) => period === null).length / row.phases;
    if (!(Math.abs(row.survivingFraction - surviving) <= 1e-12)) {
      throw new Error(`${where}: survivingFraction must be ${surviving} (phases without a broken period / phases), got ${row.survivingFraction}`);
    }
  }
}

function checkOwner(where: string, row: { orbitId: string; familyId: string }, familyId: string, orbitIds: ReadonlySet<string>): void {
  if (row.familyId !== familyId) throw new Error(`${where}: familyId must be ${familyId} (the bundle's family), got ${row.familyId}`);
  if (!orbitIds.has(row.orbitId)) throw new Error(`${where}: orbitId must be one of the family's orbits, got ${row.orbitId}`);
}
