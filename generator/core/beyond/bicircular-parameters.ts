import { SIMO_1995_BICIRCULAR, sunRateFromMonthsNd } from './model-constants.ts';

/** The Sun of the bicircular model, in Earth–Moon rotating units. */
export interface BicircularParameters {
  /** Sun mass in units of the Earth + Moon mass; 0 turns the Sun off (exactly the CR3BP). */
  sunMass: number;
  /** Distance of the Sun from the Earth–Moon barycentre, in Earth–Moon distances. */
  sunDistanceNd: number;
  /** Signed angular rate of the Sun in the rotating frame (negative: it turns clockwise there). */
  sunRateNd: number;
  /** Angle θ0 of the Sun from the +x axis at t = 0 (rad); θ(t) = θ0 + ω_s t. */
  sunPhaseRad: number;
}

/**
 * Sun mass and distance of Simó et al. (1995); the rate from the synodic and sidereal months
 * (sunRateFromMonthsNd: −0.9251988, within 4e-6 of their −0.925195985).
 */
export function bicircularParameters(overrides: Partial<BicircularParameters> = {}): BicircularParameters {
  const p: BicircularParameters = {
    sunMass: SIMO_1995_BICIRCULAR.sunMass,
    sunDistanceNd: SIMO_1995_BICIRCULAR.sunDistanceNd,
    sunRateNd: sunRateFromMonthsNd(),
    sunPhaseRad: 0,
    ...overrides,
  };
  if (!(p.sunMass >= 0) || !Number.isFinite(p.sunMass)) throw new RangeError(`sunMass must be finite and ≥ 0, got ${p.sunMass}`);
  if (!(p.sunDistanceNd > 2) || !Number.isFinite(p.sunDistanceNd)) {
    throw new RangeError(`sunDistanceNd must be finite and > 2 (outside the Earth–Moon system), got ${p.sunDistanceNd}`);
  }
  if (!Number.isFinite(p.sunRateNd)) throw new RangeError(`sunRateNd must be finite, got ${p.sunRateNd}`);
  if (!Number.isFinite(p.sunPhaseRad)) throw new RangeError(`sunPhaseRad must be finite, got ${p.sunPhaseRad}`);
  return p;
}

/** Period of the Sun's turn in the rotating frame (the model's synodic month), nondimensional. */
export function modelSynodicMonthNd(p: BicircularParameters): number {
  return (2 * Math.PI) / Math.abs(p.sunRateNd);
}
