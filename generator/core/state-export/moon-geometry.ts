// The Moon as the dated frame needs it, passed in as a function of the epoch so this module stays free
// of any ephemeris library (generator/ephemeris/geocentric-moon.ts adapts astronomy-engine for the CLI
// and the browser alike; tests may pass their own).

export interface MoonState {
  /** Geocentric, EME2000 axes. */
  moonPositionKm: [number, number, number];
  moonVelocityKmS: [number, number, number];
}

/** The Moon at an epoch given in microseconds since 1970-01-01T00:00:00 UTC. */
export type MoonAt = (epochMicros: number) => MoonState;

/** Angular rate of the Earth–Moon line (rad/s): |r × v| / |r|². */
export function earthMoonRateRadS(moon: MoonState): number {
  const [x, y, z] = moon.moonPositionKm, [vx, vy, vz] = moon.moonVelocityKmS;
  return Math.hypot(y * vz - z * vy, z * vx - x * vz, x * vy - y * vx) / (x * x + y * y + z * z);
}
