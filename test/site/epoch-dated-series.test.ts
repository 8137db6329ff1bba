// Epoch-dated downloads (Earth-centred EME2000 via the instantaneous Earth–Moon geometry): the series the
// page makes equals the core map rotatingToInertialAtEpoch fed by astronomy-engine (an independent
// ephemeris library on npm) at each sample's epoch, and the OEM, CSV and JSON carry the same numbers,
// epochs and frame names (CCSDS 502.0-B-3: REF_FRAME, CENTER_NAME, TIME_SYSTEM keywords).
import { GeoMoonState, KM_PER_AU, MakeTime } from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { rotatingToInertialAtEpoch } from '../../generator/core/beyond/rotating-to-inertial-at-epoch.ts';
import { sampleTrajectory } from '../../generator/core/propagation/sample-trajectory.ts';
import { epochDatedSeries, MAX_DATED_SAMPLES } from '../../site/scripts/state-vectors/epoch-dated-series.ts';
import { formatEpochMicros, parseEpochMicros } from '../../site/scripts/state-vectors/epoch-text.ts';
import { seriesToCsv } from '../../site/scripts/state-vectors/format-csv.ts';
import { seriesToJson } from '../../site/scripts/state-vectors/format-json.ts';
import { seriesToOem } from '../../site/scripts/state-vectors/format-oem.ts';
import { geocentricMoonAt, utDaysSinceJ2000 } from '../../site/scripts/state-vectors/moon-ephemeris.ts';
import type { OrbitDownloadData } from '../../site/scripts/state-vectors/orbit-download-data.ts';
import { DOWNLOAD_TOLERANCE, stateSeries } from '../../site/scripts/state-vectors/state-series.ts';
import { parseOem } from './parse-oem.ts';
import { ARENSTORF } from './site-test-catalog.ts';

// Hairer, Nørsett & Wanner (1993), Solving ODEs I, §II.0 (the Arenstorf orbit), with Earth–Moon LU and TU.
const orbit: OrbitDownloadData = {
  orbitId: 'test/arenstorf/0000', familyName: 'Arenstorf', systemName: 'Earth–Moon (HNW μ)', mu: ARENSTORF.mu,
  lengthUnitKm: 384_400, timeUnitS: 375_190.262, primaryName: 'Earth', secondaryName: 'Moon',
  state0: [ARENSTORF.x0, 0, 0, 0, ARENSTORF.vy0, 0], periodNd: ARENSTORF.periodNd, fileStem: 'arenstorf', earthMoon: true,
};

const START = '2031-02-11T18:00:00.000';
const startMicros = parseEpochMicros(START);

/** The Moon straight from astronomy-engine (AU, AU/day → km, km/s) at a JavaScript date. */
function moonFromLibrary(date: Date | number) {
  const s = GeoMoonState(date);
  return {
    moonPositionKm: [s.x * KM_PER_AU, s.y * KM_PER_AU, s.z * KM_PER_AU],
    moonVelocityKmS: [s.vx, s.vy, s.vz].map((v) => (v * KM_PER_AU) / 86_400),
  };
}

const series = epochDatedSeries(orbit, { periods: 1, stepNd: ARENSTORF.periodNd / 120, startMicros }, geocentricMoonAt);

describe('epoch-dated Earth-centred series', () => {
  it('dates sample i at start + t_i × TU and equals the core map fed by astronomy-engine at that epoch (1e-6 km)', () => {
    const samples = sampleTrajectory(orbit.mu, orbit.state0, ARENSTORF.periodNd, series.count, DOWNLOAD_TOLERANCE);
    expect(series.count).toBe(121);
    for (let i = 0; i < series.count; i++) {
      const elapsedS = samples.timesNd[i] * orbit.timeUnitS;
      expect(series.epochMicros![i]).toBe(startMicros + Math.round(elapsedS * 1e6));
      // UT days since J2000 (astronomy-engine's count), from whole microseconds with one rounding: the
      // ephemeris' output jitters by ~1e-5 km under sub-µs changes of its input, so the epoch must be exact.
      const ut = (series.epochMicros![i] - Date.UTC(2000, 0, 1, 12) * 1000) / 86_400_000_000;
      const expected = rotatingToInertialAtEpoch(samples.states.subarray(6 * i, 6 * i + 6), { mu: orbit.mu, ...moonFromLibrary(ut) });
      for (let k = 0; k < 3; k++) {
        expect(Math.abs(series.states[6 * i + k] - expected.positionKm[k])).toBeLessThan(1e-6);
        expect(Math.abs(series.states[6 * i + 3 + k] - expected.velocityKmS[k])).toBeLessThan(1e-9);
      }
    }
  });

  it('puts the start point on the Earth–Moon line at (x0 + μ) Moon distances, radial speed (x0 + μ) times the Moon\'s', () => {
    // Frame definition (x̂ toward the Moon, lengths in instantaneous Earth–Moon distances, Earth at −μ): a
    // state on the x-axis maps to (x0 + μ) r_Moon, and its radial velocity is (x0 + μ) (r̂ · v_Moon) since
    // ẋ0 = 0 and the rotation adds only a transverse part (common practice, e.g. Szebehely 1967 ch. 1).
    const moon = moonFromLibrary(new Date(startMicros / 1000));
    const scale = ARENSTORF.x0 + ARENSTORF.mu;
    for (let k = 0; k < 3; k++) expect(series.states[k]).toBeCloseTo(scale * moon.moonPositionKm[k], 6);
    const r = Math.hypot(...moon.moonPositionKm);
    const radial = (v: ArrayLike<number>) => (v[0] * moon.moonPositionKm[0] + v[1] * moon.moonPositionKm[1] + v[2] * moon.moonPositionKm[2]) / r;
    expect(radial(series.states.subarray(3, 6))).toBeCloseTo(scale * radial(moon.moonVelocityKmS), 9);
    // the Moon's distance at this epoch lies within its perigee–apogee range (almanac, from memory)
    expect(r).toBeGreaterThan(356_000);
    expect(r).toBeLessThan(407_000);
  });

  it("reads the ephemeris at the sample's epoch: UT days as astronomy-engine counts them from a Date", () => {
    for (const iso of ['2024-01-01T00:00:00Z', '2031-02-11T18:00:00.123Z', '1999-12-31T23:59:59.999Z']) {
      const ms = Date.parse(iso);
      expect(utDaysSinceJ2000(ms * 1000)).toBe(MakeTime(new Date(ms)).ut);
      const mine = geocentricMoonAt(ms * 1000);
      const theirs = moonFromLibrary(new Date(ms));
      mine.moonPositionKm.forEach((v, k) => expect(Math.abs(v - theirs.moonPositionKm[k])).toBeLessThan(1e-9));
      mine.moonVelocityKmS.forEach((v, k) => expect(Math.abs(v - theirs.moonVelocityKmS[k])).toBeLessThan(1e-15));
    }
  });

  it('OEM: REF_FRAME EME2000, CENTER_NAME EARTH, TIME_SYSTEM UTC, the approximation stated, the same states and epochs', () => {
    const oem = parseOem(seriesToOem(orbit, series, { startEpoch: START, creationDate: '2026-01-01T00:00:00.000' }));
    expect(oem.header.CCSDS_OEM_VERS).toBe('3.0');
    expect(oem.meta.REF_FRAME).toBe('EME2000');
    expect(oem.meta.CENTER_NAME).toBe('EARTH');
    expect(oem.meta.TIME_SYSTEM).toBe('UTC');
    expect(oem.meta.START_TIME).toBe('2031-02-11T18:00:00.000000');
    expect(oem.meta.STOP_TIME).toBe(oem.epochs[oem.epochs.length - 1]);
    const comments = oem.comments.join(' ');
    expect(comments).toMatch(/APPROXIMATION: CR3BP rotating states scaled by the instantaneous Earth-Moon distance and rate/);
    expect(comments).toMatch(/astronomy-engine/);
    expect(comments).toMatch(/verify in a high-fidelity model/);
    expect(oem.epochs).toEqual(Array.from(series.epochMicros!, formatEpochMicros));
    oem.states.forEach((state, i) => state.forEach((v, k) => expect(v).toBe(series.states[6 * i + k])));
    // consecutive epochs a step apart (in seconds of UTC)
    const stepS = series.stepNd * orbit.timeUnitS;
    expect(Date.parse(`${oem.epochs[1]}Z`) - Date.parse(`${oem.epochs[0]}Z`)).toBeCloseTo(stepS * 1000, -1);
  });

  it('CSV and JSON lead with the same UTC epochs and carry the same km, km/s states', () => {
    const lines = seriesToCsv(series).trim().split('\n');
    expect(lines[0]).toBe('epoch_utc,t_s,x_km,y_km,z_km,vx_km_s,vy_km_s,vz_km_s');
    const row = lines[5].split(',');
    expect(row[0]).toBe(formatEpochMicros(series.epochMicros![4]));
    expect(row.slice(2).map(Number)).toEqual(Array.from(series.states.subarray(24, 30)));
    const json = JSON.parse(seriesToJson(orbit, series));
    expect(json.refFrame).toBe('EME2000');
    expect(json.centerName).toBe('EARTH');
    expect(json.timeSystem).toBe('UTC');
    expect(json.epochs[4]).toBe(row[0]);
    expect(json.states[4]).toEqual(Array.from(series.states.subarray(24, 30)));
    expect(json.approximation).toMatch(/instantaneous Earth–Moon distance and rate/);
  });

  it('rejects too many samples and a model-frame request for the dated frame, naming the field', () => {
    expect(() => epochDatedSeries(orbit, { periods: 1, stepNd: ARENSTORF.periodNd / (MAX_DATED_SAMPLES + 10), startMicros }, geocentricMoonAt))
      .toThrow(new RegExp(`at most ${MAX_DATED_SAMPLES}`));
    expect(() => stateSeries(orbit, { periods: 1, stepNd: 0.1, frame: 'eme2000', units: 'km' })).toThrow(/start epoch/);
    expect(() => epochDatedSeries(orbit, { periods: 1, stepNd: 0.1, startMicros: NaN }, geocentricMoonAt)).toThrow(/^start epoch/);
  });

  it("reads the browser date-time field's forms (seconds left out, a trailing Z)", () => {
    expect(parseEpochMicros('2030-01-01T00:00')).toBe(Date.UTC(2030, 0, 1) * 1000);
    expect(parseEpochMicros('2030-01-01T06:30:15.25Z')).toBe(Date.UTC(2030, 0, 1, 6, 30, 15, 250) * 1000);
    expect(() => parseEpochMicros('2030-01-01')).toThrow(/^start epoch must look like/);
  });
});
