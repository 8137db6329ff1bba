// State-vector downloads: frames, units, CSV and CCSDS OEM text, checked against independent references.
import { describe, expect, it } from 'vitest';
import { rotatingToBodyInertial } from '../../site/lib/body-inertial-frame.ts';
import { formatEpoch, parseEpochMicros } from '../../site/scripts/state-vectors/epoch-text.ts';
import { seriesToCsv } from '../../site/scripts/state-vectors/format-csv.ts';
import { seriesToOem } from '../../site/scripts/state-vectors/format-oem.ts';
import type { OrbitDownloadData } from '../../site/scripts/state-vectors/orbit-download-data.ts';
import { stateSeries } from '../../site/scripts/state-vectors/state-series.ts';
import { parseOem } from './parse-oem.ts';
import { ARENSTORF } from './site-test-catalog.ts';

// Hairer, Nørsett & Wanner (1993), Solving ODEs I, §II.0: the Arenstorf orbit closes after one period.
const orbit: OrbitDownloadData = {
  orbitId: 'test/arenstorf/0000', familyName: 'Arenstorf', systemName: 'Earth–Moon (HNW μ)', mu: ARENSTORF.mu,
  lengthUnitKm: 384_400, timeUnitS: 375_190.262, primaryName: 'Earth', secondaryName: 'Moon',
  state0: [ARENSTORF.x0, 0, 0, 0, ARENSTORF.vy0, 0], periodNd: ARENSTORF.periodNd, fileStem: 'arenstorf', earthMoon: true,
};

describe('state series', () => {
  it('over one period starts at the initial state and closes within 1e-8 (HNW §II.0 orbit)', () => {
    const series = stateSeries(orbit, { periods: 1, stepNd: ARENSTORF.periodNd / 400, frame: 'rotating', units: 'nd' });
    expect(series.count).toBe(401);
    const first = Array.from(series.states.subarray(0, 6));
    const last = Array.from(series.states.subarray(6 * 400));
    expect(first).toEqual(orbit.state0);
    last.forEach((v, i) => expect(Math.abs(v - orbit.state0[i])).toBeLessThan(1e-8));
    expect(series.times[400]).toBe(ARENSTORF.periodNd);
  });

  it('inertial velocities are the time derivative of inertial positions (central differences)', () => {
    // Kinematics of a rotating frame (common practice): v_inertial = d/dt r_inertial, checked numerically.
    for (const frame of ['primary', 'secondary'] as const) {
      const s = stateSeries(orbit, { periods: 0.03, stepNd: 2e-5, frame, units: 'nd' });
      // away from the close lunar pass at t = 0, where the third derivative makes differences coarse
      for (const i of [Math.floor(s.count / 4), Math.floor(s.count / 2), Math.floor((3 * s.count) / 4)]) {
        for (let k = 0; k < 3; k++) {
          const derivative = (s.states[6 * (i + 1) + k] - s.states[6 * (i - 1) + k]) / (2 * s.stepNd);
          expect(Math.abs(derivative - s.states[6 * i + 3 + k])).toBeLessThan(1e-7 * (1 + Math.abs(derivative)));
        }
      }
    }
  });

  it('at t = 0 the inertial frame is the rotating one shifted to the body, plus ω × r in the velocity', () => {
    const out = new Float64Array(6);
    const state = [0.5, 0.2, 0.1, 0.3, -0.4, 0.05];
    rotatingToBodyInertial(0.1, 'secondary', 0, state, 0, out, 0);
    // relative position (0.5 − 0.9, 0.2, 0.1); ω × r = (−0.2, −0.4, 0)
    const expected = [-0.4, 0.2, 0.1, 0.3 - 0.2, -0.4 - 0.4, 0.05];
    Array.from(out).forEach((v, i) => expect(v).toBeCloseTo(expected[i], 15));
    rotatingToBodyInertial(0.1, 'primary', Math.PI / 2, state, 0, out, 0);
    // a quarter turn maps (x, y) to (−y, x); relative position (0.6, 0.2, 0.1)
    expect(out[0]).toBeCloseTo(-0.2, 14);
    expect(out[1]).toBeCloseTo(0.6, 14);
  });

  it('km units scale positions by LU, velocities by LU/TU and times by TU', () => {
    const nd = stateSeries(orbit, { periods: 0.1, stepNd: 0.05, frame: 'rotating', units: 'nd' });
    const km = stateSeries(orbit, { periods: 0.1, stepNd: 0.05, frame: 'rotating', units: 'km' });
    const vu = orbit.lengthUnitKm / orbit.timeUnitS;
    for (let i = 0; i < nd.count; i++) {
      expect(km.times[i]).toBeCloseTo(nd.times[i] * orbit.timeUnitS, 6);
      for (let k = 0; k < 3; k++) expect(km.states[6 * i + k]).toBeCloseTo(nd.states[6 * i + k] * orbit.lengthUnitKm, 6);
      for (let k = 3; k < 6; k++) expect(km.states[6 * i + k]).toBeCloseTo(nd.states[6 * i + k] * vu, 12);
    }
  });

  it('rejects a bad span or step with a one-line error naming the field', () => {
    expect(() => stateSeries(orbit, { periods: 0, stepNd: 0.1, frame: 'rotating', units: 'nd' })).toThrow(/^span must be in \(0, 1000\] periods/);
    expect(() => stateSeries(orbit, { periods: 1, stepNd: -1, frame: 'rotating', units: 'nd' })).toThrow(/^step must be a positive number/);
    expect(() => stateSeries(orbit, { periods: 100, stepNd: 1e-6, frame: 'rotating', units: 'nd' })).toThrow(/at most 200000/);
  });
});

describe('CSV and OEM text', () => {
  const series = stateSeries(orbit, { periods: 1, stepNd: ARENSTORF.periodNd / 50, frame: 'secondary', units: 'km' });

  it('CSV reads back to the same numbers', () => {
    const lines = seriesToCsv(series).trim().split('\n');
    expect(lines[0]).toBe('t_s,x_km,y_km,z_km,vx_km_s,vy_km_s,vz_km_s');
    expect(lines.length).toBe(series.count + 1);
    const row = lines[7].split(',').map(Number);
    expect(row).toEqual([series.times[6], ...series.states.subarray(36, 42)]);
  });

  it('OEM has the KVN structure of CCSDS 502.0-B-3 and parses back to the same states', () => {
    // Structure per CCSDS 502.0-B-3 (ODM), OEM in KVN: version line, header, META_START..META_STOP, data lines
    // "epoch x y z vx vy vz" in km and km/s (from memory).
    const text = seriesToOem(orbit, series, { startEpoch: '2030-01-01T00:00:00.000', creationDate: '2026-01-01T00:00:00.000' });
    const oem = parseOem(text);
    expect(oem.header.CCSDS_OEM_VERS).toBe('3.0');
    expect(oem.header.ORIGINATOR).toBeTruthy();
    expect(oem.meta.CENTER_NAME).toBe('MOON');
    expect(oem.meta.REF_FRAME).toBe('CR3BP_INERTIAL');
    expect(oem.meta.TIME_SYSTEM).toBe('TDB');
    expect(oem.meta.START_TIME).toBe('2030-01-01T00:00:00.000000');
    expect(oem.comments.join(' ')).toMatch(/CR3BP model frame, not an ephemeris frame/);
    expect(oem.epochs.length).toBe(series.count);
    expect(oem.meta.STOP_TIME).toBe(oem.epochs[oem.epochs.length - 1]);
    oem.states.forEach((state, i) => state.forEach((v, k) => expect(v).toBe(series.states[6 * i + k])));
    // epochs step by the series step in seconds
    const stepS = series.stepNd * orbit.timeUnitS;
    expect(Date.parse(`${oem.epochs[1]}Z`) - Date.parse(`${oem.epochs[0]}Z`)).toBeCloseTo(stepS * 1000, -1);
  });

  it('OEM refuses nondimensional states (the standard wants km and km/s)', () => {
    const nd = stateSeries(orbit, { periods: 0.1, stepNd: 0.05, frame: 'rotating', units: 'nd' });
    expect(() => seriesToOem(orbit, nd, { startEpoch: '2030-01-01T00:00:00', creationDate: 'x' })).toThrow(/km/);
  });
});

describe('epoch text', () => {
  it('adds seconds exactly to the microsecond across a leap day (Gregorian calendar, common practice)', () => {
    const start = parseEpochMicros('2028-02-28T12:00:00.000');
    expect(formatEpoch(start, 86_400)).toBe('2028-02-29T12:00:00.000000');
    expect(formatEpoch(start, 2 * 86_400 + 0.000001)).toBe('2028-03-01T12:00:00.000001');
    expect(formatEpoch(parseEpochMicros('2030-12-31T23:59:59.5'), 0.75)).toBe('2031-01-01T00:00:00.250000');
  });

  it('rejects a malformed start epoch naming the field', () => {
    expect(() => parseEpochMicros('yesterday')).toThrow(/^start epoch must look like/);
    expect(() => parseEpochMicros('2030-13-01T00:00:00')).toThrow(/not a valid date/);
  });
});
