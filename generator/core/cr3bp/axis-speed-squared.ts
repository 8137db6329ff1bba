/** v² = 2Ω(x, 0, 0) − C: the squared speed a state on the x-axis must have for Jacobi constant C (negative
 *  where the point lies outside the Hill region). */
export function axisSpeedSquared(mu: number, x: number, jacobi: number): number {
  const twiceOmega = x * x + (2 * (1 - mu)) / Math.abs(x + mu) + (2 * mu) / Math.abs(x - 1 + mu);
  return twiceOmega - jacobi;
}
