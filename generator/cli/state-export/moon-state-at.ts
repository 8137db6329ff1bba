// The geocentric Moon at an epoch from astronomy-engine (an ephemeris library on npm): GeoMoonState gives
// position in AU and velocity in AU/day in its EQJ axes (J2000 mean equator and equinox), here in km and
// km/s. The epoch goes in as UT days since J2000 (2000-01-01T12:00:00 UTC), so fractions of a millisecond
// are kept; astronomy-engine treats UTC as UT1.
import { GeoMoonState, KM_PER_AU } from 'astronomy-engine';

const J2000_UTC_MS = Date.UTC(2000, 0, 1, 12, 0, 0);
const MS_PER_DAY = 86_400_000;

export interface MoonState {
  moonPositionKm: [number, number, number];
  moonVelocityKmS: [number, number, number];
}

export function moonStateAt(utcMs: number): MoonState {
  const s = GeoMoonState((utcMs - J2000_UTC_MS) / MS_PER_DAY);
  const v = KM_PER_AU / 86400;
  return {
    moonPositionKm: [s.x * KM_PER_AU, s.y * KM_PER_AU, s.z * KM_PER_AU],
    moonVelocityKmS: [s.vx * v, s.vy * v, s.vz * v],
  };
}

/** Angular rate of the Earth–Moon line (rad/s): |r × v| / |r|². */
export function earthMoonRateRadS(moon: MoonState): number {
  const [x, y, z] = moon.moonPositionKm, [vx, vy, vz] = moon.moonVelocityKmS;
  return Math.hypot(y * vz - z * vy, z * vx - x * vz, x * vy - y * vx) / (x * x + y * y + z * z);
}
