// Weighted Birkhoff average (Das, Saiki, Sander & Yorke 2017, "Quantitative quasiperiodicity", Nonlinearity
// 30): Σ w(n/N) f_n / Σ w(n/N) with the bump w(t) = exp(−1/(t(1 − t))). On a quasi-periodic orbit (an
// invariant curve) it converges faster than any power of N; on a chaotic orbit only like N^(−1/2).

/** Weighted average of values[from … to − 1]. */
export function weightedBirkhoffAverage(values: ArrayLike<number>, from: number, to: number): number {
  const count = to - from;
  if (!(count >= 2)) throw new RangeError(`weighted Birkhoff average needs at least 2 values, got ${count}`);
  let sum = 0;
  let weights = 0;
  // t = (j + 1)/(count + 1) keeps every weight positive (the ends are where the bump vanishes).
  for (let j = 0; j < count; j++) {
    const t = (j + 1) / (count + 1);
    const w = Math.exp(-1 / (t * (1 - t)));
    sum += w * values[from + j];
    weights += w;
  }
  return sum / weights;
}
