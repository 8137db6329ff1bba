// The Moon's geometry for the dated state export, from astronomy-engine (an ephemeris library on npm that
// runs in Node and in the browser; the site bundles it, so nothing is fetched). One adapter for the CLI and
// the orbit page: GeoMoonState gives position in AU and velocity in AU/day in its EQJ axes (J2000 mean
// equator and equinox), returned here in km and km/s. astronomy-engine treats UTC as UT1.
import { GeoMoonState, KM_PER_AU } from 'astronomy-engine';
import type { MoonState } from '../core/state-export/moon-geometry.ts';

/** astronomy-engine counts UT in days from 2000-01-01T12:00:00Z. */
const J2000_UNIX_MICROS = Date.UTC(2000, 0, 1, 12, 0, 0) * 1000;
const KM_S_PER_AU_DAY = KM_PER_AU / 86_400;

/**
 * Days since J2000 from µs since 1970, as a number (a Date would drop the microseconds). The subtraction is
 * exact in integers, so on whole milliseconds this equals what astronomy-engine computes from a Date.
 */
export function utDaysSinceJ2000(epochMicros: number): number {
  return (epochMicros - J2000_UNIX_MICROS) / 86_400_000_000;
}

export function geocentricMoonAt(epochMicros: number): MoonState {
  const s = GeoMoonState(utDaysSinceJ2000(epochMicros));
  return {
    moonPositionKm: [s.x * KM_PER_AU, s.y * KM_PER_AU, s.z * KM_PER_AU],
    moonVelocityKmS: [s.vx * KM_S_PER_AU_DAY, s.vy * KM_S_PER_AU_DAY, s.vz * KM_S_PER_AU_DAY],
  };
}
