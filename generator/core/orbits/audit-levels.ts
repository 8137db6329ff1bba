// The Jacobi levels of a completeness audit: drawn uniformly from a range with a seeded PRNG, so that an
// audit can be repeated, and never within 1e-9 of a level discovery used, so that the audit is
// independent of discovery's sampling.
/** Levels this close to a discovery level count as the same level. */
export const SAME_LEVEL_TOLERANCE = 1e-9;

/** Draws that may be rejected before giving up (a range covered by discovery levels). */
const MAX_DRAWS_PER_LEVEL = 1000;

export interface LevelRange {
  min: number;
  max: number;
}

/** `count` levels in [min, max), sorted; `draw` (e.g. seededRandom) continues one stream across calls. */
export function drawAuditLevels(draw: () => number, count: number, range: LevelRange, discoveryLevels: readonly number[]): number[] {
  if (!(range.max > range.min)) throw new RangeError(`audit level range is empty (from ${range.min} to ${range.max})`);
  const levels: number[] = [];
  let draws = 0;
  while (levels.length < count) {
    if (++draws > MAX_DRAWS_PER_LEVEL * count) throw new RangeError(`no audit level in ${range.min}..${range.max} away from discovery's levels`);
    const level = range.min + draw() * (range.max - range.min);
    if (discoveryLevels.some((used) => Math.abs(used - level) <= SAME_LEVEL_TOLERANCE)) continue;
    levels.push(level);
  }
  return levels.sort((a, b) => a - b);
}
