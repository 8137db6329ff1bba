// `cycler-atlas export-state`: a catalog orbit's rotating-frame state dated at an epoch, as an Earth-centred
// inertial state (astronomy-engine's EQJ axes, named EME2000) or in the rotating frame; CSV, JSON, CCSDS OEM.
// Outside sources:
//  - astronomy-engine (an independent ephemeris library on npm): GeoMoonState and GeoMoon give the geocentric
//    Moon (AU, AU/day, EQJ). The Moon point (1 − μ, 0, 0) at rest must land on it, position and velocity,
//    to round-off (the accuracy the mapping states for this point: rotating-to-inertial-at-epoch.ts);
//  - kinematics: the velocities written must be the time derivative of the positions written (central
//    differences of positions over ±10 min agree to better than 1 m/s, the stated size of the left-out
//    frame-plane turning); dating samples with the mean time unit instead would miss by tens of m/s;
//  - CCSDS 502.0-B-3 (Orbit Data Messages), KVN form of the OEM: header keys, a META_START … META_STOP block
//    with the mandatory keys, then data lines "epoch x y z vx vy vz" (7 fields, km and km/s).
import { GeoMoon, GeoMoonState, KM_PER_AU } from 'astronomy-engine';
import { read as readTable } from 'vega';
import { beforeAll, describe, expect, it } from 'vitest';
import { openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import type { FamilyBundle, SystemRow } from '../../catalog-db/types.ts';
import { runExportState, type ExportStateFlags } from '../../generator/cli/commands/export-state.ts';
import { findSystemPreset, massRatioOf, timeUnitSecondsOf } from '../../generator/core/cr3bp/system-presets.ts';
import { runFamilyJob } from '../../generator/core/orbits/run-family-job.ts';
import { UsageError } from '../../generator/errors/usage-error.ts';
import { runCli } from '../cli/run-cli.ts';
import { makeBundle, makeRunInput, makeSystem } from '../catalog-db/make-rows.ts';
import { useTempCatalogDir } from '../catalog-db/temp-catalog-path.ts';

const preset = findSystemPreset('earth-moon');
const MU = massRatioOf(preset);
const EARTH_MOON: SystemRow = { ...preset, mu: MU, timeUnitS: timeUnitSecondsOf(preset) };
const MOON_POINT_ID = 'earth-moon/MOON/a/0000';
const EPOCHS = ['2024-01-01T00:00:00Z', '2027-09-30T06:30:00Z', '2031-02-11T18:00:00Z'];
const catalogPath = useTempCatalogDir();

let db: string;
let lyapunovId: string;

beforeAll(() => {
  db = catalogPath('states.sqlite');
  const writer = openCatalogForWrite(db);
  writer.upsertSystem(EARTH_MOON);
  writer.upsertSystem(makeSystem({ id: 'pluto-charon', mu: 0.1085 }));
  const runId = writer.startRun(makeRunInput());
  // A real orbit: the first member of the L1 Lyapunov family (amplitude 0.01, Richardson 1980 first guess).
  const lyapunov = runFamilyJob({
    key: 'test:L1', name: 'L1 Lyapunov (test)', system: EARTH_MOON, seed: { kind: 'lyapunov', point: 'L1', amplitudeNd: 0.01 },
    limits: { maxMembers: 1, jacobiMin: 2.9, jacobiMax: 3.3, maxPeriodNd: 10, unstableStop: { indexAbove: 1e9, members: 10 }, initialStepNd: 1e-3, maxStepNd: 1e-2 },
    tolerance: { rtol: 1e-12, atol: 1e-12 }, indexTolerance: 1e-6,
  }).bundles[0]!;
  writer.writeFamily({ ...lyapunov, family: { ...lyapunov.family, runId } });
  lyapunovId = lyapunov.orbits[0]!.id;
  // The Moon point as an "orbit" row (only its state is used without --periods).
  const moon: FamilyBundle = makeBundle('earth-moon/MOON/a', { runId, systemId: 'earth-moon', orbitCount: 1, signature: 'E0M0' });
  moon.orbits[0]!.state0 = [1 - MU, 0, 0, 0, 0, 0];
  writer.writeFamily(moon);
  writer.writeFamily(makeBundle('pluto-charon/B2S1/a', { runId, systemId: 'pluto-charon', orbitCount: 1 }));
  writer.close();
});

const flags = (over: Partial<ExportStateFlags>): ExportStateFlags => ({ orbit: lyapunovId, epoch: EPOCHS[0], frame: 'icrf-earth', units: 'km', db, format: 'json', ...over });
const json = (over: Partial<ExportStateFlags>) => JSON.parse(runExportState(flags(over)));
const utcMs = (epochUtc: string) => Date.parse(`${epochUtc.slice(0, 23)}Z`) + Number(epochUtc.slice(23)) / 1000;

describe('export-state in icrf-earth', () => {
  it('maps the Moon point (1 − μ, 0, 0) at rest onto astronomy-engine\'s geocentric Moon', () => {
    for (const epoch of EPOCHS) {
      const out = json({ orbit: MOON_POINT_ID, epoch });
      expect(out).toMatchObject({ refFrame: 'EME2000', centerName: 'EARTH', timeSystem: 'UTC', frame: 'eme2000' });
      expect(out.states).toHaveLength(1);
      const [state] = out.states;
      expect(state.epochUtc).toBe(epoch.replace('Z', '.000000'));
      const date = new Date(epoch);
      const s = GeoMoonState(date);
      const g = GeoMoon(date);
      const r = Math.hypot(s.x, s.y, s.z) * KM_PER_AU;
      const position = [g.x, g.y, g.z].map((v) => v * KM_PER_AU);
      const velocity = [s.vx, s.vy, s.vz].map((v) => (v * KM_PER_AU) / 86400);
      const miss = Math.hypot(...state.positionKm.map((v: number, k: number) => v - position[k]!));
      expect(miss).toBeLessThan(1e-9 * r); // round-off of ~4e5 km
      const speedMiss = Math.hypot(...state.velocityKmS.map((v: number, k: number) => v - velocity[k]!));
      // km/s; GeoMoonState's velocity is a difference of positions 1.7 s apart, so the last bits of sine and
      // cosine (the export runs under portable ones, the reference under the engine's) show at ~1e-10 km/s
      expect(speedMiss).toBeLessThan(1e-9);
    }
  });

  it('writes velocities that are the time derivative of the positions written (to < 1 m/s)', () => {
    const out = json({ periods: '0.3', step: '10min' });
    const s = out.states as Array<{ epochUtc: string; tNd: number; positionKm: number[]; velocityKmS: number[] }>;
    expect(s.length).toBeGreaterThan(100);
    for (let k = 1; k < s.length; k++) expect(utcMs(s[k]!.epochUtc) - utcMs(s[k - 1]!.epochUtc)).toBe(600_000); // on the 10 min step
    let worst = 0;
    let worstMeanTime = 0;
    for (let k = 1; k + 1 < s.length; k++) {
      const dtS = (utcMs(s[k + 1]!.epochUtc) - utcMs(s[k - 1]!.epochUtc)) / 1000;
      const dtMeanS = (s[k + 1]!.tNd - s[k - 1]!.tNd) * EARTH_MOON.timeUnitS;
      const diff = (dt: number) => Math.hypot(...[0, 1, 2].map((j) => (s[k + 1]!.positionKm[j]! - s[k - 1]!.positionKm[j]!) / dt - s[k]!.velocityKmS[j]!));
      worst = Math.max(worst, diff(dtS));
      worstMeanTime = Math.max(worstMeanTime, diff(dtMeanS));
    }
    expect(worst).toBeLessThan(1e-3);
    expect(worstMeanTime).toBeGreaterThan(10e-3); // the check can fail: mean-time dating is off by tens of m/s
  });

  it('states the approximation in every format', () => {
    const out = json({});
    expect(out.comments.join(' ')).toMatch(/APPROXIMATION: a CR3BP solution placed in the real sky/);
    expect(out.comments.join(' ')).toMatch(/instantaneous Earth-Moon frame/);
    const csv = runExportState(flags({ format: 'csv' }));
    expect(csv).toMatch(/^# .*\r\n# Orbit .*\r\n# Frame: .*\r\n# APPROXIMATION/);
    const oem = runExportState(flags({ format: 'oem' }));
    expect(oem).toMatch(/\nCOMMENT APPROXIMATION: a CR3BP solution/);
  });
});

describe('export-state as CCSDS OEM (KVN)', () => {
  /** A minimal reader of the KVN OEM layout (CCSDS 502.0-B-3, §5 and §7), written for this test. */
  function parseOem(text: string) {
    const lines = text.split('\n').filter((line) => line.trim() !== '');
    const header = new Map<string, string>();
    const meta = new Map<string, string>();
    const data: string[][] = [];
    let part: 'header' | 'meta' | 'data' = 'header';
    for (const line of lines) {
      if (line.startsWith('COMMENT')) continue;
      if (line === 'META_START') { part = 'meta'; continue; }
      if (line === 'META_STOP') { part = 'data'; continue; }
      if (part === 'data') { data.push(line.trim().split(/\s+/)); continue; }
      const match = /^([A-Z_]+)\s*=\s*(.*)$/.exec(line);
      if (!match) throw new Error(`not a KVN line: ${line}`);
      (part === 'header' ? header : meta).set(match[1]!, match[2]!.trim());
    }
    return { firstLine: lines[0], header, meta, data };
  }

  it('has the header keys, the META block and data lines of 7 fields', () => {
    const text = runExportState(flags({ format: 'oem', periods: '1', step: '2h' }), Date.parse('2026-05-01T12:00:00Z'));
    expect(/^[\x09\x0a\x20-\x7e]*$/.test(text)).toBe(true); // KVN is ASCII
    expect(text).toContain("tolerance rtol 1e-12, atol 1e-14 (the catalog run's)"); // the run row's (makeRunInput), not a constant
    const oem = parseOem(text);
    expect(oem.firstLine).toBe('CCSDS_OEM_VERS = 3.0');
    expect(oem.header.get('CREATION_DATE')).toBe('2026-05-01T12:00:00.000000');
    expect(oem.header.get('ORIGINATOR')).toBe('CYCLER-ATLAS');
    for (const key of ['OBJECT_NAME', 'OBJECT_ID', 'CENTER_NAME', 'REF_FRAME', 'TIME_SYSTEM', 'START_TIME', 'STOP_TIME']) expect(oem.meta.has(key), key).toBe(true);
    expect(oem.meta.get('OBJECT_ID')).toBe(lyapunovId);
    expect([oem.meta.get('CENTER_NAME'), oem.meta.get('REF_FRAME'), oem.meta.get('TIME_SYSTEM')]).toEqual(['EARTH', 'EME2000', 'UTC']);
    const js = json({ periods: '1', step: '2h' });
    expect(oem.data).toHaveLength(js.states.length);
    const epochs = oem.data.map((fields) => {
      expect(fields).toHaveLength(7);
      expect(fields[0]).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d+$/);
      for (const value of fields.slice(1)) expect(Number.isFinite(Number(value)), value).toBe(true);
      return utcMs(fields[0]!);
    });
    for (let k = 1; k < epochs.length; k++) expect(epochs[k]!).toBeGreaterThan(epochs[k - 1]!);
    expect(oem.meta.get('START_TIME')).toBe(oem.data[0]![0]);
    expect(oem.meta.get('STOP_TIME')).toBe(oem.data.at(-1)![0]);
    // The same numbers as the JSON (16 significant digits in the OEM).
    const numbers = oem.data[5]!.slice(1).map(Number);
    const state = js.states[5];
    [...state.positionKm, ...state.velocityKmS].forEach((v: number, k: number) => expect(numbers[k]).toBeCloseTo(v, 9));
    // Samples reach one period: the last one at or just past it.
    expect(js.states.at(-1).tNd).toBeGreaterThanOrEqual(js.periodNd);
    expect(js.states.at(-2).tNd).toBeLessThan(js.periodNd);
  });

  it('names the model frame and barycentre for --frame rotating, scaled by the catalog units', () => {
    const oem = parseOem(runExportState(flags({ format: 'oem', frame: 'rotating' })));
    expect([oem.meta.get('CENTER_NAME'), oem.meta.get('REF_FRAME')]).toEqual(['EARTH-MOON BARYCENTER', 'CR3BP_ROTATING']);
    const js = json({ frame: 'rotating', orbit: MOON_POINT_ID });
    expect(js.states[0].positionKm).toEqual([(1 - MU) * 384400, 0, 0]);
  });
});

describe('export-state as CSV', () => {
  it('has comment lines, a header and one row per sample', () => {
    const csv = runExportState(flags({ format: 'csv', periods: '0.5', step: '6h' }));
    const body = csv.split('\r\n').filter((line) => !line.startsWith('#')).join('\r\n');
    const rows = readTable(body, { type: 'csv', parse: {} }) as Array<Record<string, string>>;
    expect(Object.keys(rows[0]!)).toEqual(['epochUtc', 'tNd', 'xKm', 'yKm', 'zKm', 'vxKmS', 'vyKmS', 'vzKmS']);
    expect(rows).toHaveLength(json({ periods: '0.5', step: '6h' }).states.length);
  });
});

describe('export-state bad input', () => {
  const bad: Array<[Partial<ExportStateFlags>, string]> = [
    [{ orbit: undefined }, '--orbit: missing'],
    [{ orbit: 'earth-moon/E9M9/z/0001' }, '--orbit: "earth-moon/E9M9/z/0001" is not in'],
    [{ epoch: undefined }, '--epoch: missing'],
    [{ epoch: 'yesterday' }, '--epoch: "yesterday" is not allowed (ISO 8601 in UTC'],
    [{ epoch: '2030-02-30T00:00:00Z' }, '--epoch: "2030-02-30T00:00:00Z" is not a calendar date and time'],
    [{ epoch: '2030-01-01T00:00:00+01:00' }, 'only UTC (Z) is accepted'],
    [{ epoch: '2200-01-01T00:00:00Z' }, '--epoch: "2200-01-01T00:00:00Z" is outside the allowed years 1900 to 2100'],
    [{ frame: 'gcrf' }, '--frame: "gcrf" is not allowed (allowed: rotating, inertial-primary, inertial-secondary, eme2000, icrf-earth)'],
    [{ units: 'lu' }, '--units: "lu" is not allowed (allowed: km, nd)'],
    [{ units: 'nd', frame: 'rotating', format: 'oem' }, '--units: "nd" is not allowed with --format oem (allowed: km)'],
    [{ format: 'xml' }, '--format: "xml" is not allowed (allowed: csv, json, oem)'],
    [{ periods: '0' }, '--periods: "0" is not allowed (a number in (0, 1000])'],
    [{ periods: '1', step: 'often' }, '--step: "often" is not allowed'],
    [{ periods: '1', step: '-1h' }, '--step: "-1h" is not allowed'],
    [{ step: '1h' }, '--step: only allowed with --periods'],
    [{ periods: '1000', step: '1s' }, '--step: "1s" gives'],
    [{ db: '/nonexistent/catalog.sqlite' }, '--db: "/nonexistent/catalog.sqlite" does not exist'],
    [{ orbit: 'pluto-charon/B2S1/a/0000' }, '--frame: icrf-earth needs an Earth–Moon orbit'],
  ];
  it.each(bad)('%j → one line naming the field', (over, message) => {
    let error: unknown;
    try {
      runExportState(flags(over));
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(UsageError);
    expect((error as Error).message).toContain(message);
    expect((error as Error).message).not.toContain('\n');
  });

  it('exits 2 with the one line from the real command', async () => {
    const run = await runCli(['export-state', '--db', db, '--orbit', lyapunovId, '--epoch', '2030-13-01']);
    expect(run.code).toBe(2);
    expect(run.stderr.trim().split('\n')).toEqual(['cycler-atlas: --epoch: "2030-13-01" is not a calendar date and time (ISO 8601 in UTC, e.g. 2030-01-01T00:00:00Z)']);
    const ok = await runCli(['export-state', '--db', db, '--orbit', MOON_POINT_ID, '--epoch', EPOCHS[1]!, '--format', 'csv']);
    expect(ok.code).toBe(0);
    expect(ok.stdout).toContain('epochUtc,tNd,xKm');
  });
});
