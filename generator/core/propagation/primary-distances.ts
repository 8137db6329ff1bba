/** Distances of a spatial state's position from the larger (r1) and smaller (r2) primary. */
export function distanceToPrimary(mu: number, s: ArrayLike<number>): number {
  return Math.hypot(s[0] + mu, s[1], s[2]);
}

export function distanceToSecondary(mu: number, s: ArrayLike<number>): number {
  return Math.hypot(s[0] - 1 + mu, s[1], s[2]);
}
