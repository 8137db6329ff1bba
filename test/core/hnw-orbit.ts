// The periodic test orbit of Hairer, Nørsett & Wanner, Solving ODEs I (2nd ed. 1993), §II.0 (an "Arenstorf
// orbit"): same rotating frame and primaries at −μ and 1 − μ as ours. Values as printed there (DESIGN.md).
export const HNW_MU = 0.012277471;
export const HNW_PERIOD = 17.0652165601579625588917206249;
export const HNW_STATE_PLANAR: readonly number[] = [0.994, 0, 0, -2.00158510637908252240537862224];
export const HNW_STATE_SPATIAL: readonly number[] = [0.994, 0, 0, 0, -2.00158510637908252240537862224, 0];

export function maxAbsDifference(a: ArrayLike<number>, b: ArrayLike<number>, count = a.length): number {
  let worst = 0;
  for (let i = 0; i < count; i++) worst = Math.max(worst, Math.abs(a[i] - b[i]));
  return worst;
}
