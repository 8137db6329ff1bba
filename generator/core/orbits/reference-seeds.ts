// First guesses for the reference families, refined by the fixed-x0 corrector.

/**
 * Small planar Lyapunov orbit about a collinear point from linear theory (Richardson 1980, Celest. Mech. 22):
 * x = x_L − A cos ωt, y = κ A sin ωt with κ = (ω² + 1 + 2c₂)/(2ω). Returns (x0, vy0).
 */
export function lyapunovGuess(mu: number, xCollinear: number, amplitudeNd: number): [number, number] {
  const c2 = (1 - mu) / Math.abs(xCollinear + mu) ** 3 + mu / Math.abs(xCollinear - 1 + mu) ** 3;
  const omega = Math.sqrt((2 - c2 + Math.sqrt(9 * c2 * c2 - 8 * c2)) / 2);
  const kappa = (omega * omega + 1 + 2 * c2) / (2 * omega);
  return [xCollinear - amplitudeNd, kappa * amplitudeNd * omega];
}

/**
 * Retrograde orbit about the smaller primary, started on its far side: two-body circular speed √(μ/d)
 * plus the frame's rotation d (common practice for the rotating-frame velocity of a retrograde orbit).
 */
export function retrogradeGuess(mu: number, distanceNd: number): [number, number] {
  return [1 - mu + distanceNd, -(Math.sqrt(mu / distanceNd) + distanceNd)];
}
