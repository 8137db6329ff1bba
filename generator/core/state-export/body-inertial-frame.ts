// Rotating CR3BP frame → inertial axes centred on one primary. The rotating frame turns at rate 1, so
// at nondimensional time t it has turned by angle t; the inertial state about body B (fixed at (x_B, 0, 0)
// in the rotating frame) is r = R(t)(ρ − ρ_B) and v = R(t)(ρ̇ + ω × (ρ − ρ_B)) with ω = (0, 0, 1)
// (common practice, e.g. Szebehely 1967 ch. 1). Both frames coincide at t = 0. Runs in Node and the browser.

export type FrameCentre = 'primary' | 'secondary';

/** x of the body in the rotating frame: the larger at −μ, the smaller at 1 − μ. */
export function bodyX(mu: number, centre: FrameCentre): number {
  return centre === 'primary' ? -mu : 1 - mu;
}

/** Writes the inertial state (6 numbers) about `centre` at time tNd into out (may alias nothing else). */
export function rotatingToBodyInertial(
  mu: number, centre: FrameCentre, tNd: number, state: ArrayLike<number>, offset: number, out: Float64Array, outOffset: number,
): void {
  const rx = state[offset] - bodyX(mu, centre);
  const ry = state[offset + 1];
  const rz = state[offset + 2];
  // ρ̇ + ω × ρ_rel, with ω × (rx, ry, rz) = (−ry, rx, 0)
  const wx = state[offset + 3] - ry;
  const wy = state[offset + 4] + rx;
  const wz = state[offset + 5];
  const c = Math.cos(tNd);
  const s = Math.sin(tNd);
  out[outOffset] = c * rx - s * ry;
  out[outOffset + 1] = s * rx + c * ry;
  out[outOffset + 2] = rz;
  out[outOffset + 3] = c * wx - s * wy;
  out[outOffset + 4] = s * wx + c * wy;
  out[outOffset + 5] = wz;
}
