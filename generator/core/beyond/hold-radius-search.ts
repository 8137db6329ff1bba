// The search for the hold radius: the largest displacement whose trial holds. Displacements grow by a
// factor from a small first one until a trial fails (or the cap is reached); then bisection between the
// last holding and the first failing displacement. The region of invariant curves need not be a disc
// (islands, thin chaotic layers), so this finds the edge of the part connected to the fixed point along
// the line searched, to the bracket width the bisections leave.

export interface SearchSettings {
  firstDisplacementNd: number;
  growthFactor: number;
  maxDisplacementNd: number;
  bisections: number;
}

export interface Trial<T> {
  displacementNd: number;
  holds: boolean;
  detail: T;
}

export interface SearchResult<T> {
  /** Largest displacement found to hold (0 when the first already fails). */
  radiusNd: number;
  /** Smallest displacement found to fail (Infinity when the cap held). */
  failingNd: number;
  /** The trial at radiusNd, or null. */
  outermost: Trial<T> | null;
  trials: Trial<T>[];
}

export function checkSearchSettings(s: SearchSettings): void {
  if (!(s.firstDisplacementNd > 0) || !Number.isFinite(s.firstDisplacementNd)) {
    throw new RangeError(`firstDisplacementNd must be a positive finite number, got ${s.firstDisplacementNd}`);
  }
  if (!(s.growthFactor > 1) || !Number.isFinite(s.growthFactor)) throw new RangeError(`growthFactor must be a finite number > 1, got ${s.growthFactor}`);
  if (!(s.maxDisplacementNd >= s.firstDisplacementNd) || !Number.isFinite(s.maxDisplacementNd)) {
    throw new RangeError(`maxDisplacementNd must be finite and ≥ firstDisplacementNd, got ${s.maxDisplacementNd}`);
  }
  if (!Number.isInteger(s.bisections) || s.bisections < 0 || s.bisections > 60) {
    throw new RangeError(`bisections must be an integer in [0, 60], got ${s.bisections}`);
  }
}

export function searchHoldRadius<T>(trial: (displacementNd: number) => { holds: boolean; detail: T }, settings: SearchSettings): SearchResult<T> {
  checkSearchSettings(settings);
  const trials: Trial<T>[] = [];
  const run = (d: number): Trial<T> => {
    const outcome = trial(d);
    const t = { displacementNd: d, holds: outcome.holds, detail: outcome.detail };
    trials.push(t);
    return t;
  };
  let outermost: Trial<T> | null = null;
  let failingNd = Infinity;
  for (let d = settings.firstDisplacementNd; ; d = Math.min(d * settings.growthFactor, settings.maxDisplacementNd)) {
    const t = run(d);
    if (!t.holds) {
      failingNd = d;
      break;
    }
    outermost = t;
    if (d >= settings.maxDisplacementNd) break;
  }
  if (outermost && Number.isFinite(failingNd)) {
    for (let i = 0; i < settings.bisections; i++) {
      const mid = 0.5 * (outermost.displacementNd + failingNd);
      const t = run(mid);
      if (t.holds) outermost = t;
      else failingNd = mid;
    }
  }
  return { radiusNd: outermost ? outermost.displacementNd : 0, failingNd, outermost, trials };
}
