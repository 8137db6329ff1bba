// Epoch-dated states: the rotating → geocentric inertial map with the instantaneous Earth–Moon frame, checked
// against astronomy-engine (an independent ephemeris library on npm; GeoMoonState: geocentric Moon in AU and
// AU/day, EQJ axes) at several epochs: the Moon point lands on the ephemeris Moon, and the velocity the map
// gives a point fixed in the rotating frame matches the finite difference of its mapped positions at nearby
// epochs (frames rebuilt from the ephemeris each time) to the stated ~1 m/s.
import { GeoMoon, GeoMoonState, KM_PER_AU } from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { rotatingToInertialAtEpoch } from '../../generator/core/beyond/index.ts';
import { MU } from './helpers/earth-moon-orbits.ts';

const EPOCHS = ['2024-01-01T00:00:00Z', '2025-06-15T12:00:00Z', '2027-09-30T06:30:00Z', '2031-02-11T18:00:00Z'];

function moonAt(ms: number) {
  const s = GeoMoonState(new Date(ms));
  return {
    moonPositionKm: [s.x * KM_PER_AU, s.y * KM_PER_AU, s.z * KM_PER_AU],
    moonVelocityKmS: [s.vx, s.vy, s.vz].map((v) => (v * KM_PER_AU) / 86400),
  };
}

const distance = (a: ArrayLike<number>, b: ArrayLike<number>) => Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);

describe('rotating state → geocentric inertial state at an epoch', () => {
  it('maps the Moon point (1 − μ, 0, 0) at rest onto the ephemeris Moon (position and velocity)', () => {
    for (const iso of EPOCHS) {
      const ms = Date.parse(iso);
      const moon = moonAt(ms);
      const mapped = rotatingToInertialAtEpoch([1 - MU, 0, 0, 0, 0, 0], { mu: MU, ...moon });
      // GeoMoon (position only) as a second call of the ephemeris.
      const g = GeoMoon(new Date(ms));
      const r = Math.hypot(g.x, g.y, g.z) * KM_PER_AU;
      expect(r).toBeGreaterThan(356000); // perigee/apogee range of the Moon (astronomical almanac, from memory)
      expect(r).toBeLessThan(407000);
      expect(distance(mapped.positionKm, [g.x * KM_PER_AU, g.y * KM_PER_AU, g.z * KM_PER_AU])).toBeLessThan(1e-6 * r);
      expect(distance(mapped.velocityKmS, moon.moonVelocityKmS)).toBeLessThan(1e-9); // km/s
    }
  });

  it('maps the Earth point (−μ, 0, 0) at rest onto the geocentre, and L4 onto the equilateral point', () => {
    for (const iso of EPOCHS) {
      const moon = moonAt(Date.parse(iso));
      const earth = rotatingToInertialAtEpoch([-MU, 0, 0, 0, 0, 0], { mu: MU, ...moon });
      expect(Math.hypot(...earth.positionKm)).toBeLessThan(1e-9);
      expect(Math.hypot(...earth.velocityKmS)).toBeLessThan(1e-15);
      const l4 = rotatingToInertialAtEpoch([0.5 - MU, Math.sqrt(3) / 2, 0, 0, 0, 0], { mu: MU, ...moon });
      const r = Math.hypot(...moon.moonPositionKm);
      expect(Math.hypot(...l4.positionKm)).toBeCloseTo(r, 6); // equidistant from Earth and Moon …
      expect(distance(l4.positionKm, moon.moonPositionKm)).toBeCloseTo(r, 6);
      // … and ahead of the Moon in its motion (L4 leads: positive along r × v from r to it).
      const [mx, my, mz] = moon.moonPositionKm, [vx, vy, vz] = moon.moonVelocityKmS, [px, py, pz] = l4.positionKm;
      const h = [my * vz - mz * vy, mz * vx - mx * vz, mx * vy - my * vx];
      expect(h[0] * (my * pz - mz * py) + h[1] * (mz * px - mx * pz) + h[2] * (mx * py - my * px)).toBeGreaterThan(0);
    }
  });

  it('gives velocities matching finite differences of mapped positions over ±10 min to ~1 m/s (frame plane turning left out)', () => {
    const points = [
      [1 - MU, 0, 0, 0, 0, 0],
      [0.5 - MU, Math.sqrt(3) / 2, 0, 0, 0, 0],
      [-1.0, 0.2, 0.1, 0, 0, 0],
      [0.8, 0.05, 0, 0.1, -0.2, 0.05],
    ];
    const dtS = 600;
    for (const iso of EPOCHS) {
      const ms = Date.parse(iso);
      for (const p of points) {
        // The finite difference moves the frame, not the point: the point must be fixed in the rotating frame,
        // so a rotating velocity is followed by shifting the point along it by ±dt in nondimensional time.
        const moon = moonAt(ms);
        const mapped = rotatingToInertialAtEpoch(p, { mu: MU, ...moon });
        const rate = (() => {
          const [mx, my, mz] = moon.moonPositionKm, [vx, vy, vz] = moon.moonVelocityKmS;
          return Math.hypot(my * vz - mz * vy, mz * vx - mx * vz, mx * vy - my * vx) / (mx * mx + my * my + mz * mz);
        })();
        const at = (sign: number) => {
          const shifted = [p[0] + sign * dtS * rate * p[3], p[1] + sign * dtS * rate * p[4], p[2] + sign * dtS * rate * p[5], p[3], p[4], p[5]];
          return rotatingToInertialAtEpoch(shifted, { mu: MU, ...moonAt(ms + sign * dtS * 1000) }).positionKm;
        };
        const plus = at(1), minus = at(-1);
        const fd = [0, 1, 2].map((k) => (plus[k] - minus[k]) / (2 * dtS));
        expect(distance(fd, mapped.velocityKmS) * 1000, `${iso} ${p}`).toBeLessThan(2); // m/s
      }
    }
  });

  it('scales by given mean values when asked (catalog scaling: the Moon point then misses the Moon by |D − r|)', () => {
    const moon = moonAt(Date.parse(EPOCHS[0]));
    const r = Math.hypot(...moon.moonPositionKm);
    const mapped = rotatingToInertialAtEpoch([1 - MU, 0, 0, 0, 0, 0], { mu: MU, ...moon, earthMoonDistanceKm: 384400, earthMoonRateRadS: 2.6617e-6 });
    expect(Math.hypot(...mapped.positionKm)).toBeCloseTo(384400, 6);
    expect(distance(mapped.positionKm, moon.moonPositionKm)).toBeCloseTo(Math.abs(r - 384400), 6);
  });

  it('rejects bad input with a message naming the field', () => {
    const moon = moonAt(Date.parse(EPOCHS[0]));
    expect(() => rotatingToInertialAtEpoch([1, 0, 0], { mu: MU, ...moon })).toThrow(/stateNd/);
    expect(() => rotatingToInertialAtEpoch([1, 0, 0, 0, 0, 0], { mu: 0.7, ...moon })).toThrow(/mu/);
    expect(() => rotatingToInertialAtEpoch([1, 0, 0, 0, 0, 0], { mu: MU, moonPositionKm: [1, 0, 0], moonVelocityKmS: [2, 0, 0] })).toThrow(/parallel/);
    expect(() => rotatingToInertialAtEpoch([1, 0, 0, 0, 0, 0], { mu: MU, ...moon, earthMoonDistanceKm: -5 })).toThrow(/earthMoonDistanceKm/);
  });
});
