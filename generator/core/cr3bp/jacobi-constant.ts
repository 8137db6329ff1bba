/**
 * Jacobi constant C = x² + y² + 2(1 − μ)/r₁ + 2μ/r₂ − v² (Szebehely 1967 convention; larger C = less energy).
 * Accepts a spatial state (x, y, z, vx, vy, vz) or, with planar = true, (x, y, vx, vy).
 */
export function jacobiConstant(mu: number, state: ArrayLike<number>, planar = false): number {
  const x = state[0], y = state[1];
  const z = planar ? 0 : state[2];
  const vx = planar ? state[2] : state[3];
  const vy = planar ? state[3] : state[4];
  const vz = planar ? 0 : state[5];
  const r1 = Math.hypot(x + mu, y, z);
  const r2 = Math.hypot(x - 1 + mu, y, z);
  return x * x + y * y + (2 * (1 - mu)) / r1 + (2 * mu) / r2 - (vx * vx + vy * vy + vz * vz);
}
