// The geocentric Moon at an epoch from astronomy-engine (bundled into the site, so nothing is fetched):
// GeoMoonState gives position in AU and velocity in AU/day, J2000 mean equator and equinox (EQJ), which
// is the EME2000 frame to within the ~20 mas frame bias. Loaded only when a dated frame is asked for.
import { GeoMoonState, KM_PER_AU } from 'astronomy-engine';
import type { MoonState } from './epoch-dated-series.ts';

/** astronomy-engine counts UT in days from 2000-01-01T12:00:00Z. */
const J2000_UNIX_MS = Date.UTC(2000, 0, 1, 12, 0, 0);
const SECONDS_PER_DAY = 86_400;

/**
 * Days since J2000 from µs since 1970, as a number (a Date would drop the microseconds). The subtraction is
 * exact in integers, so on whole milliseconds this equals what astronomy-engine computes from a Date.
 */
export function utDaysSinceJ2000(epochMicros: number): number {
  return (epochMicros - J2000_UNIX_MS * 1000) / 86_400_000_000;
}

export function geocentricMoonAt(epochMicros: number): MoonState {
  const s = GeoMoonState(utDaysSinceJ2000(epochMicros));
  const v = KM_PER_AU / SECONDS_PER_DAY;
  return {
    moonPositionKm: [s.x * KM_PER_AU, s.y * KM_PER_AU, s.z * KM_PER_AU],
    moonVelocityKmS: [s.vx * v, s.vy * v, s.vz * v],
  };
}
