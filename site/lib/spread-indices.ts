/** Indices 0..n−1 spread evenly, first and last always included (all of them when n ≤ count). */
export function spreadIndices(n: number, count: number): number[] {
  if (n <= count) return Array.from({ length: n }, (_, i) => i);
  return [...new Set(Array.from({ length: count }, (_, k) => Math.round((k * (n - 1)) / (count - 1))))];
}
