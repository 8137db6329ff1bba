// The core state export's series: sample epochs, model times, frames and units. Outside sources beside
// each check: Hairer, Nørsett & Wanner (1993) §II.0 (the Arenstorf orbit closes after one period);
// astronomy-engine (an independent ephemeris library on npm) for the Moon; kinematics (velocities are the
// time derivative of positions; common practice); the Gregorian calendar (common practice).
import { GeoMoonState, KM_PER_AU, MakeTime } from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { rotatingToInertialAtEpoch } from '../../generator/core/beyond/rotating-to-inertial-at-epoch.ts';
import { sampleTrajectoryAt } from '../../generator/core/propagation/sample-trajectory.ts';
import { rotatingToBodyInertial } from '../../generator/core/state-export/body-inertial-frame.ts';
import { parseEpochMicros } from '../../generator/core/state-export/epoch-text.ts';
import { MAX_DATED_SAMPLES, stateSeries, type StateRequest } from '../../generator/core/state-export/state-series.ts';
import { geocentricMoonAt, utDaysSinceJ2000 } from '../../generator/ephemeris/geocentric-moon.ts';
import { ARENSTORF_ORBIT as orbit } from './arenstorf-export-orbit.ts';

const START = parseEpochMicros('2031-02-11T18:00:00Z');
const request = (over: Partial<StateRequest>): StateRequest => ({ frame: 'rotating', units: 'nd', startEpochMicros: START, span: null, ...over });

/** The Moon straight from astronomy-engine (AU, AU/day → km, km/s) at UT days since J2000. */
function moonFromLibrary(utDays: number) {
  const s = GeoMoonState(utDays);
  return {
    moonPositionKm: [s.x * KM_PER_AU, s.y * KM_PER_AU, s.z * KM_PER_AU],
    moonVelocityKmS: [s.vx, s.vy, s.vz].map((v) => (v * KM_PER_AU) / 86_400),
  };
}

describe('model frames', () => {
  it('over one period starts at the initial state and closes within 1e-8 (HNW §II.0 orbit)', () => {
    const s = stateSeries(orbit, request({ span: { periods: 1, stepS: (orbit.periodNd * orbit.timeUnitS) / 400 } }));
    expect(s.count).toBe(401);
    expect(Array.from(s.states.subarray(0, 6))).toEqual(orbit.state0);
    Array.from(s.states.subarray(6 * 400)).forEach((v, i) => expect(Math.abs(v - orbit.state0[i]!)).toBeLessThan(1e-8));
    expect(s.timesNd[400]).toBeCloseTo(orbit.periodNd, 12);
  });

  it('puts sample epochs on the step asked: a 1 h step gives whole hours, also across a leap day (Gregorian calendar)', () => {
    const s = stateSeries(orbit, request({ startEpochMicros: parseEpochMicros('2028-02-28T22:00:00Z'), span: { periods: 0.3, stepS: 3600 } }));
    expect(s.count).toBe(Math.ceil((0.3 * orbit.periodNd * orbit.timeUnitS) / 3600) + 1);
    for (let i = 0; i < s.count; i++) expect(s.epochMicros[i]).toBe(Date.UTC(2028, 1, 28, 22 + i) * 1000);
    expect(s.timesNd[1]).toBeCloseTo(3600 / orbit.timeUnitS, 15);
  });

  it('runs to the first sample at or past the span', () => {
    const s = stateSeries(orbit, request({ span: { periods: 0.5, stepS: 7200 } }));
    const spanNd = 0.5 * orbit.periodNd;
    expect(s.timesNd[s.count - 1]).toBeGreaterThanOrEqual(spanNd);
    expect(s.timesNd[s.count - 2]).toBeLessThan(spanNd);
  });

  it('body-centred inertial velocities are the time derivative of inertial positions (central differences)', () => {
    for (const frame of ['inertial-primary', 'inertial-secondary'] as const) {
      const s = stateSeries(orbit, request({ frame, span: { periods: 0.03, stepS: 2e-5 * orbit.timeUnitS } }));
      for (const i of [Math.floor(s.count / 4), Math.floor(s.count / 2), Math.floor((3 * s.count) / 4)]) {
        const dt = s.timesNd[i + 1]! - s.timesNd[i - 1]!;
        for (let k = 0; k < 3; k++) {
          const derivative = (s.states[6 * (i + 1) + k]! - s.states[6 * (i - 1) + k]!) / dt;
          expect(Math.abs(derivative - s.states[6 * i + 3 + k]!)).toBeLessThan(1e-7 * (1 + Math.abs(derivative)));
        }
      }
    }
  });

  it('at t = 0 the inertial frame is the rotating one shifted to the body, plus ω × r; a quarter turn maps (x, y) to (−y, x) (common practice)', () => {
    const out = new Float64Array(6);
    const state = [0.5, 0.2, 0.1, 0.3, -0.4, 0.05];
    rotatingToBodyInertial(0.1, 'secondary', 0, state, 0, out, 0);
    [-0.4, 0.2, 0.1, 0.3 - 0.2, -0.4 - 0.4, 0.05].forEach((v, i) => expect(out[i]).toBeCloseTo(v, 15));
    rotatingToBodyInertial(0.1, 'primary', Math.PI / 2, state, 0, out, 0);
    expect(out[0]).toBeCloseTo(-0.2, 14);
    expect(out[1]).toBeCloseTo(0.6, 14);
  });

  it('km scales positions by LU and velocities by LU/TU (the catalog units)', () => {
    const span = { periods: 0.1, stepS: 0.05 * orbit.timeUnitS };
    const nd = stateSeries(orbit, request({ span }));
    const km = stateSeries(orbit, request({ span, units: 'km' }));
    const vu = orbit.lengthUnitKm / orbit.timeUnitS;
    for (let i = 0; i < nd.count; i++) {
      for (let k = 0; k < 3; k++) expect(km.states[6 * i + k]).toBeCloseTo(nd.states[6 * i + k]! * orbit.lengthUnitKm, 6);
      for (let k = 3; k < 6; k++) expect(km.states[6 * i + k]).toBeCloseTo(nd.states[6 * i + k]! * vu, 12);
    }
  });
});

describe('EME2000 frame', () => {
  const stepS = 1800;
  const s = stateSeries(orbit, request({ frame: 'eme2000', units: 'km', span: { periods: 0.4, stepS } }), geocentricMoonAt);

  it('maps each sample with the Moon of astronomy-engine at the epoch written (1e-6 km, 1e-9 km/s)', () => {
    expect(s.epochMicros[1]! - s.epochMicros[0]!).toBe(stepS * 1e6);
    const rotating = sampleTrajectoryAt(orbit.mu, orbit.state0, s.timesNd, orbit.tolerance).states; // the same propagator run
    for (const i of [0, 7, s.count - 1]) {
      const ut = (s.epochMicros[i]! - Date.UTC(2000, 0, 1, 12) * 1000) / 86_400_000_000;
      const expected = rotatingToInertialAtEpoch(rotating.subarray(6 * i, 6 * i + 6), { mu: orbit.mu, ...moonFromLibrary(ut) });
      for (let k = 0; k < 3; k++) {
        expect(Math.abs(s.states[6 * i + k]! - expected.positionKm[k]!)).toBeLessThan(1e-6);
        expect(Math.abs(s.states[6 * i + 3 + k]! - expected.velocityKmS[k]!)).toBeLessThan(1e-9);
      }
    }
  });

  it('writes velocities that are the time derivative of the positions written (to < 1 m/s, the stated size of the left-out plane turning)', () => {
    // 10 min steps around the far point (t near T/2), away from the close lunar passes where differences are coarse
    const near = stateSeries(orbit, request({ frame: 'eme2000', units: 'km', startEpochMicros: START, span: { periods: 0.6, stepS: 600 } }), geocentricMoonAt);
    let worst = 0;
    let worstMeanTime = 0;
    let checked = 0;
    for (let k = 1; k + 1 < near.count; k++) {
      if (Math.abs(near.timesNd[k]! / orbit.periodNd - 0.5) > 0.08) continue;
      checked++;
      const diff = (dtS: number) => Math.hypot(...[0, 1, 2].map((j) => (near.states[6 * (k + 1) + j]! - near.states[6 * (k - 1) + j]!) / dtS - near.states[6 * k + 3 + j]!));
      worst = Math.max(worst, diff((near.epochMicros[k + 1]! - near.epochMicros[k - 1]!) / 1e6));
      worstMeanTime = Math.max(worstMeanTime, diff((near.timesNd[k + 1]! - near.timesNd[k - 1]!) * orbit.timeUnitS));
    }
    expect(checked).toBeGreaterThan(100);
    expect(worst).toBeLessThan(1e-3);
    expect(worstMeanTime).toBeGreaterThan(10e-3); // the check can fail: dating by the mean time unit is off by tens of m/s
  });

  it('model time is the turn of the Earth–Moon line: not the mean t · TU (they part by more than 1 min within 0.4 period)', () => {
    const last = s.count - 1;
    const meanS = s.timesNd[last]! * orbit.timeUnitS;
    const writtenS = (s.epochMicros[last]! - s.epochMicros[0]!) / 1e6;
    expect(Math.abs(meanS - writtenS)).toBeGreaterThan(60);
  });

  it('reads the ephemeris at UT days since J2000 as astronomy-engine counts them from a Date', () => {
    for (const iso of ['2024-01-01T00:00:00Z', '2031-02-11T18:00:00.123Z', '1999-12-31T23:59:59.999Z']) {
      const ms = Date.parse(iso);
      expect(utDaysSinceJ2000(ms * 1000)).toBe(MakeTime(new Date(ms)).ut);
    }
  });

  it('refuses nondimensional units and too many samples, naming the field', () => {
    expect(() => stateSeries(orbit, request({ frame: 'eme2000', units: 'nd' }), geocentricMoonAt)).toThrow(/^units:/);
    expect(() => stateSeries(orbit, request({ frame: 'eme2000', units: 'km', span: { periods: 10, stepS: 1 } }), geocentricMoonAt))
      .toThrow(new RegExp(`more than ${MAX_DATED_SAMPLES}`));
  });
});

