// Which members of a family the screenings look at, from its stable windows (catalog rows built from the
// stability map): every member strictly inside a window with |ν| < 1 (the edges, located at |ν| = 1, are
// left out), and among them the middle member of each window plus up to `membersPerWindow` more, spread
// over the window's arclength, for the costlier hold radius.
import type { OrbitRow, StableWindowRow } from './family-rows.ts';

export interface ScreenedMembers {
  /** Stable members inside a window, in family order. */
  stable: OrbitRow[];
  /** Ids of the members that also get a hold radius. */
  holdRadiusIds: Set<string>;
}

export function pickScreenedMembers(orbits: readonly OrbitRow[], windows: readonly StableWindowRow[], membersPerWindow: number): ScreenedMembers {
  if (!Number.isInteger(membersPerWindow) || membersPerWindow < 0) {
    throw new RangeError(`membersPerWindow must be an integer ≥ 0, got ${membersPerWindow}`);
  }
  const chosen = new Set<string>();
  const holdRadiusIds = new Set<string>();
  for (const window of windows) {
    const low = Math.min(window.fromArclength, window.toArclength);
    const high = Math.max(window.fromArclength, window.toArclength);
    const inside = orbits.filter((o) => o.arclength > low && o.arclength < high && Math.abs(o.stabilityIndex) < 1);
    for (const orbit of inside) chosen.add(orbit.id);
    const middle = inside.find((o) => o.id === window.midOrbitId);
    if (middle) holdRadiusIds.add(middle.id);
    // Evenly spread targets at (k − ½)/m of the window; each takes the nearest member not yet taken.
    const candidates = inside.filter((o) => o !== middle);
    const m = Math.min(membersPerWindow, candidates.length);
    for (let k = 1; k <= m; k++) {
      const target = low + ((k - 0.5) / m) * (high - low);
      let best: OrbitRow | null = null;
      for (const c of candidates) {
        if (holdRadiusIds.has(c.id)) continue;
        if (best === null || Math.abs(c.arclength - target) < Math.abs(best.arclength - target)) best = c;
      }
      if (best) holdRadiusIds.add(best.id);
    }
  }
  return { stable: orbits.filter((o) => chosen.has(o.id)), holdRadiusIds };
}
