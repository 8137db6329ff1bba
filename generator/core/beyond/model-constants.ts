// Constants of the two models "beyond the three-body model", in Earth–Moon rotating units (length: the
// Earth–Moon distance; time: 1/(mean motion of the Moon), so the Moon's sidereal period is 2π).

/**
 * Bicircular restricted four-body model as tabulated by Simó, Gómez, Jorba & Masdemont (1995), "The
 * bicircular model near the triangular libration points of the RTBP" (from memory): Sun mass in units of the
 * Earth + Moon mass, Sun–barycentre distance in Earth–Moon distances, and the Sun's angular rate in the
 * Earth–Moon rotating frame (magnitude; the Sun turns clockwise there, so the signed rate is negative).
 */
export const SIMO_1995_BICIRCULAR = {
  sunMass: 328900.54,
  sunDistanceNd: 388.81114,
  sunRateMagnitudeNd: 0.925195985,
  source: 'Simó, Gómez, Jorba & Masdemont 1995 (from memory)',
} as const;

/** Synodic and sidereal month (astronomical almanacs, from memory; the same values as DESIGN.md). */
export const SYNODIC_MONTH_DAYS = 29.530589;
export const SIDEREAL_MONTH_DAYS = 27.321662;

/**
 * Signed angular rate of the Sun in the Earth–Moon rotating frame, from the two months: the frame turns at
 * n_M = 2π/T_sid, the Sun (seen from the Earth–Moon barycentre) at n_S = 2π/T_year, and the synodic month is
 * the period of n_M − n_S. In units of n_M: ω_s = −(n_M − n_S)/n_M = −(1 − T_sid/T_year) = −T_sid/T_syn.
 * This keeps the number of Sun cycles per lunar revolution right, which is what the dynamics in the rotating
 * frame feel (the absolute length of a model time unit, 4.3425 d, does not enter).
 */
export function sunRateFromMonthsNd(siderealMonthDays = SIDEREAL_MONTH_DAYS, synodicMonthDays = SYNODIC_MONTH_DAYS): number {
  if (!(siderealMonthDays > 0) || !(synodicMonthDays > siderealMonthDays)) {
    throw new RangeError(`months: need 0 < siderealMonthDays < synodicMonthDays, got ${siderealMonthDays}, ${synodicMonthDays}`);
  }
  return -siderealMonthDays / synodicMonthDays;
}

/** Lunar orbital eccentricity used by the elliptic model (common practice: mean value 0.0549). */
export const LUNAR_ECCENTRICITY = 0.0549;
