// The core state export's writers and epoch text. Outside sources: CCSDS 502.0-B-3 (Orbit Data Messages),
// OEM in KVN form: version line, header keys, META_START … META_STOP with the mandatory keys, data lines
// "epoch x y z vx vy vz" in km and km/s (from memory); RFC 4180 for CSV records; the Gregorian calendar
// (common practice).
import { describe, expect, it } from 'vitest';
import { formatEpochMicros, parseEpochMicros } from '../../generator/core/state-export/epoch-text.ts';
import { formatStateCsv } from '../../generator/core/state-export/format-csv.ts';
import { formatStateJson } from '../../generator/core/state-export/format-json.ts';
import { formatStateOem } from '../../generator/core/state-export/format-oem.ts';
import { stateSeries, type StateRequest } from '../../generator/core/state-export/state-series.ts';
import { geocentricMoonAt } from '../../generator/ephemeris/geocentric-moon.ts';
import { parseOem } from '../site/parse-oem.ts';
import { ARENSTORF_ORBIT as orbit } from './arenstorf-export-orbit.ts';

const START = parseEpochMicros('2030-01-01T00:00:00Z');
const CREATED = parseEpochMicros('2026-05-01T12:00:00Z');
const request = (over: Partial<StateRequest>): StateRequest => ({
  frame: 'inertial-secondary', units: 'km', startEpochMicros: START, span: { periods: 1, stepS: 6 * 3600 }, ...over,
});

describe('OEM (CCSDS 502.0-B-3, KVN)', () => {
  it('has the header, the META block and data lines that read back to the same states and epochs', () => {
    const series = stateSeries(orbit, request({}));
    const text = formatStateOem(series, CREATED);
    expect(/^[\x0a\x20-\x7e]*$/.test(text)).toBe(true); // KVN is ASCII
    const oem = parseOem(text);
    expect(text.split('\n')[0]).toBe('CCSDS_OEM_VERS = 3.0');
    expect(oem.header.CREATION_DATE).toBe('2026-05-01T12:00:00.000000');
    expect(oem.header.ORIGINATOR).toBe('CYCLER-ATLAS');
    expect(oem.meta).toMatchObject({ OBJECT_ID: orbit.orbitId, CENTER_NAME: 'MOON', REF_FRAME: 'CR3BP_INERTIAL', TIME_SYSTEM: 'UTC' });
    expect(oem.meta.START_TIME).toBe('2030-01-01T00:00:00.000000');
    expect(oem.meta.STOP_TIME).toBe(oem.epochs.at(-1));
    expect(oem.epochs[1]).toBe('2030-01-01T06:00:00.000000');
    expect(oem.epochs).toEqual(Array.from(series.epochMicros, formatEpochMicros));
    oem.states.forEach((state, i) => expect(state).toEqual(Array.from(series.states.subarray(6 * i, 6 * i + 6))));
    expect(oem.comments.join(' ')).toMatch(/APPROXIMATION: states in a CR3BP model frame/);
  });

  it('names the EME2000 frame, the Earth and UTC, and states the approximation', () => {
    const series = stateSeries(orbit, request({ frame: 'eme2000', span: { periods: 0.1, stepS: 3600 } }), geocentricMoonAt);
    const oem = parseOem(formatStateOem(series, CREATED));
    expect([oem.meta.REF_FRAME, oem.meta.CENTER_NAME, oem.meta.TIME_SYSTEM]).toEqual(['EME2000', 'EARTH', 'UTC']);
    const comments = oem.comments.join(' ');
    expect(comments).toMatch(/APPROXIMATION: a CR3BP solution placed in the real sky/);
    expect(comments).toMatch(/astronomy-engine/);
    expect(oem.epochs.slice(0, 3)).toEqual(['2030-01-01T00:00:00.000000', '2030-01-01T01:00:00.000000', '2030-01-01T02:00:00.000000']);
  });

  it('refuses nondimensional states (the standard wants km and km/s)', () => {
    expect(() => formatStateOem(stateSeries(orbit, request({ units: 'nd' })), CREATED)).toThrow(/^units:/);
  });
});

describe('CSV and JSON', () => {
  const series = stateSeries(orbit, request({ frame: 'rotating', units: 'nd' }));

  it('CSV: comment lines, a header with units, one CRLF record per state with the same numbers (RFC 4180)', () => {
    const lines = formatStateCsv(series).split('\r\n');
    expect(lines.at(-1)).toBe('');
    const body = lines.filter((line) => line !== '' && !line.startsWith('#'));
    expect(lines.filter((line) => line.startsWith('#')).join(' ')).toMatch(/APPROXIMATION/);
    expect(body[0]).toBe('epochUtc,tNd,xLu,yLu,zLu,vxLuTu,vyLuTu,vzLuTu');
    expect(body.length).toBe(series.count + 1);
    const row = body[3]!.split(',');
    expect(row[0]).toBe('2030-01-01T12:00:00.000000');
    expect(row.slice(1).map(Number)).toEqual([series.timesNd[2], ...series.states.subarray(12, 18)]);
  });

  it('JSON: the orbit, frame names, units in the key names, the same epochs and states', () => {
    const json = JSON.parse(formatStateJson(series));
    expect(json).toMatchObject({ orbitId: orbit.orbitId, frame: 'rotating', refFrame: 'CR3BP_ROTATING', centerName: 'EARTH-MOON BARYCENTER', timeSystem: 'UTC' });
    expect(json.states).toHaveLength(series.count);
    expect(json.states[2]).toEqual({
      epochUtc: '2030-01-01T12:00:00.000000', tNd: series.timesNd[2],
      positionLu: Array.from(series.states.subarray(12, 15)), velocityLuTu: Array.from(series.states.subarray(15, 18)),
    });
  });
});

describe('epoch text', () => {
  it('reads UTC forms (seconds left out, Z, +00:00, the date alone) exactly to the microsecond (Gregorian calendar)', () => {
    expect(parseEpochMicros('2030-01-01T00:00')).toBe(Date.UTC(2030, 0, 1) * 1000);
    expect(parseEpochMicros('2030-01-01')).toBe(Date.UTC(2030, 0, 1) * 1000);
    expect(parseEpochMicros('2030-01-01T06:30:15.25Z')).toBe(Date.UTC(2030, 0, 1, 6, 30, 15, 250) * 1000);
    expect(parseEpochMicros('2028-02-29T12:00:00.000001+00:00')).toBe(Date.UTC(2028, 1, 29, 12) * 1000 + 1);
    expect(formatEpochMicros(Date.UTC(2028, 1, 29, 12) * 1000 + 1)).toBe('2028-02-29T12:00:00.000001');
    expect(formatEpochMicros(Date.UTC(1969, 11, 31, 23, 59, 59) * 1000 + 250_000)).toBe('1969-12-31T23:59:59.250000');
  });

  it('refuses what is not a UTC calendar date and time in 1900–2100, saying why', () => {
    expect(() => parseEpochMicros('yesterday')).toThrow(/^"yesterday" is not allowed \(ISO 8601 in UTC/);
    expect(() => parseEpochMicros('2030-02-30T00:00:00Z')).toThrow(/is not a calendar date and time/);
    expect(() => parseEpochMicros('2030-01-01T00:00:00+01:00')).toThrow(/only UTC \(Z\) is accepted/);
    expect(() => parseEpochMicros('2200-01-01T00:00:00Z')).toThrow(/outside the allowed years 1900 to 2100/);
  });
});
