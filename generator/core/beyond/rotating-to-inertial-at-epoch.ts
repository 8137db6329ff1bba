// A rotating-frame state of the Earth–Moon CR3BP, dated: mapped to geocentric inertial coordinates with the
// instantaneous ("osculating") Earth–Moon frame at an epoch, from the Moon's geocentric state there.

export interface EpochFrameInput {
  mu: number;
  /** Geocentric Moon position (km) and velocity (km/s) at the epoch, in an inertial frame (e.g. EQJ/J2000). */
  moonPositionKm: ArrayLike<number>;
  moonVelocityKmS: ArrayLike<number>;
  /** Length unit (km). Default: the instantaneous Earth–Moon distance |r|. */
  earthMoonDistanceKm?: number;
  /** Angular rate of the frame (rad/s): one nondimensional time unit is 1/rate. Default: |r × v|/|r|². */
  earthMoonRateRadS?: number;
}

export interface InertialState {
  /** Geocentric, in the frame of the Moon's state. */
  positionKm: Float64Array;
  velocityKmS: Float64Array;
}

/**
 * Maps a nondimensional rotating state (x, y, z, ẋ, ẏ, ż; barycentric, Earth at (−μ, 0, 0), Moon at
 * (1 − μ, 0, 0)) to a geocentric inertial one at an epoch. Frame: x̂ toward the Moon, ẑ along r × v, ŷ = ẑ × x̂.
 * Lengths scale by D (the instantaneous distance unless given) and the frame pulsates with it; time scales by
 * the instantaneous rate n. With ξ = (x + μ, y, z) relative to the Earth and R = [x̂ ŷ ẑ]:
 *   position = D R ξ,   velocity = (Ḋ/D) D R ξ + D n R (ξ' + ẑ × ξ),   Ḋ/D = (r·v)/|r|².
 * With the defaults the point (1 − μ, 0, 0) at rest maps exactly onto the Moon's position and velocity, and
 * the Earth's centre onto the origin. The approximation: the frame is the osculating one — the turning of
 * the Moon's orbital plane (ẑ moves under the Sun's pull, a few 1e-4 of the orbital rate) is left out of
 * the velocity, as is the change of n and D over the state's own motion (they enter only accelerations); and
 * the model's μ fixes where the barycentre sits. Errors of order 1 m/s in velocity off the x-axis; positions
 * are exact for the frame as defined. Mean values for D and n (e.g. 384400 km and 2.6617e-6 rad/s) keep the
 * catalog's scaling instead, at the price of the Moon point missing the Moon by |D − |r|| (up to ~2e4 km).
 * Pure: the caller brings the Moon's state from an ephemeris (the CLI uses astronomy-engine).
 */
export function rotatingToInertialAtEpoch(stateNd: ArrayLike<number>, input: EpochFrameInput): InertialState {
  if (stateNd.length !== 6) throw new RangeError(`stateNd must have 6 numbers, got ${stateNd.length}`);
  for (let i = 0; i < 6; i++) if (!Number.isFinite(stateNd[i])) throw new RangeError(`stateNd[${i}] must be finite, got ${stateNd[i]}`);
  const { mu, moonPositionKm: r, moonVelocityKmS: v } = input;
  if (!(mu > 0 && mu <= 0.5)) throw new RangeError(`mu must be in (0, 0.5], got ${mu}`);
  if (r.length !== 3 || v.length !== 3) throw new RangeError('moonPositionKm and moonVelocityKmS must have 3 numbers each');
  const rNorm = Math.hypot(r[0], r[1], r[2]);
  const hx = r[1] * v[2] - r[2] * v[1], hy = r[2] * v[0] - r[0] * v[2], hz = r[0] * v[1] - r[1] * v[0];
  const hNorm = Math.hypot(hx, hy, hz);
  if (!(rNorm > 0) || !(hNorm > 0) || !Number.isFinite(rNorm + hNorm)) {
    throw new RangeError('moonPositionKm and moonVelocityKmS must be finite, nonzero and not parallel');
  }
  const D = input.earthMoonDistanceKm ?? rNorm;
  const n = input.earthMoonRateRadS ?? hNorm / (rNorm * rNorm);
  if (!(D > 0) || !Number.isFinite(D)) throw new RangeError(`earthMoonDistanceKm must be a positive finite number, got ${D}`);
  if (!(n > 0) || !Number.isFinite(n)) throw new RangeError(`earthMoonRateRadS must be a positive finite number, got ${n}`);
  const pulsation = (r[0] * v[0] + r[1] * v[1] + r[2] * v[2]) / (rNorm * rNorm); // Ḋ/D, 1/s
  const ex = [r[0] / rNorm, r[1] / rNorm, r[2] / rNorm];
  const ez = [hx / hNorm, hy / hNorm, hz / hNorm];
  const ey = [ez[1] * ex[2] - ez[2] * ex[1], ez[2] * ex[0] - ez[0] * ex[2], ez[0] * ex[1] - ez[1] * ex[0]];
  const xi = [stateNd[0] + mu, stateNd[1], stateNd[2]];
  // Velocity in the rotating axes, per time unit, with the frame's turn: ξ' + ẑ × ξ.
  const w = [stateNd[3] - xi[1], stateNd[4] + xi[0], stateNd[5]];
  const positionKm = new Float64Array(3);
  const velocityKmS = new Float64Array(3);
  for (let k = 0; k < 3; k++) {
    const p = D * (xi[0] * ex[k] + xi[1] * ey[k] + xi[2] * ez[k]);
    positionKm[k] = p;
    velocityKmS[k] = pulsation * p + D * n * (w[0] * ex[k] + w[1] * ey[k] + w[2] * ez[k]);
  }
  return { positionKm, velocityKmS };
}
