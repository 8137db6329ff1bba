export interface EllipticStart {
  /** Pulsating-coordinate state at f0: the CR3BP numbers themselves (see below). */
  stateNd: Float64Array;
  /** Independent variable at the start: the true anomaly f0 (rad). */
  startAnomalyRad: number;
  /** Primaries' distance at f0 over the semi-major axis, (1 − e²)/(1 + e cos f0). */
  distanceScale: number;
  /** Physical rotating-frame speed over the CR3BP one for the same numbers, (1 + e cos f0)/√(1 − e²). */
  velocityScale: number;
}

/**
 * Initial condition of the elliptic model (pulsating coordinates, derivatives with respect to the true
 * anomaly f) from a CR3BP state at t = 0, started at true anomaly f0: the same six numbers.
 *
 * Why this choice: pulsating coordinates measure lengths in units of the instantaneous primaries' distance,
 * so the same numbers put the particle at the same place relative to both primaries (the Lagrange points
 * stay where they are), and at e = 0 the run is exactly the CR3BP one. The approximation: the physical
 * state differs from the CR3BP one by O(e). With r = a(1 − e²)/(1 + e cos f), physical position r·x and
 * velocity in the rotating frame (dr/dt)·x + r·ḟ·x', the velocity is scaled by (1 + e cos f0)/√(1 − e²)
 * (within ±5.5 % for the Moon) plus a radial term (e sin f0/√(1 − e²))·x, relative to the CR3BP state.
 * Matching the physical velocity instead would change the Jacobi-like energy of the pulsating problem and
 * move the start off the orbit's own section geometry by the same O(e), with nothing gained for a screening
 * whose purpose is to ask whether the orbit survives an O(e) perturbation.
 */
export function ellipticInitialState(stateNd: ArrayLike<number>, eccentricity: number, trueAnomalyRad: number): EllipticStart {
  if (stateNd.length !== 6) throw new RangeError(`stateNd must have 6 numbers, got ${stateNd.length}`);
  if (!(eccentricity >= 0 && eccentricity < 1)) throw new RangeError(`eccentricity must be in [0, 1), got ${eccentricity}`);
  if (!Number.isFinite(trueAnomalyRad)) throw new RangeError(`trueAnomalyRad must be finite, got ${trueAnomalyRad}`);
  const ecos = eccentricity * Math.cos(trueAnomalyRad);
  return {
    stateNd: Float64Array.from(stateNd),
    startAnomalyRad: trueAnomalyRad,
    distanceScale: (1 - eccentricity * eccentricity) / (1 + ecos),
    velocityScale: (1 + ecos) / Math.sqrt(1 - eccentricity * eccentricity),
  };
}
