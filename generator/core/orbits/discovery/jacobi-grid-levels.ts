// Jacobi levels of the discovery grid: uniform in log(C(L1) − C) from the lowest level up to a gap just
// below C(L1), so that levels crowd where families crowd and fold (just below the neck's opening).

export interface JacobiGridSpec {
  /** C of L1: the neck closes above it, so no cycler lives there. */
  jacobiL1: number;
  lowest: number;
  /** C(L1) − C of the highest level (> 0). */
  gapBelowL1: number;
  count: number;
}

export function jacobiGridLevels({ jacobiL1, lowest, gapBelowL1, count }: JacobiGridSpec): number[] {
  const widest = jacobiL1 - lowest;
  if (!(widest > gapBelowL1) || !(gapBelowL1 > 0)) throw new RangeError(`Jacobi grid: lowest level ${lowest} must lie below C(L1) − gap = ${jacobiL1 - gapBelowL1}`);
  if (count === 1) return [lowest];
  const logWidest = Math.log(widest), logGap = Math.log(gapBelowL1);
  const levels: number[] = [];
  for (let n = 0; n < count; n++) levels.push(jacobiL1 - Math.exp(logWidest + (n / (count - 1)) * (logGap - logWidest)));
  return levels;
}
