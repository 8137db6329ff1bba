// The states `export-state` writes: samples of a catalog orbit in the CR3BP (model time from 0), each
// given an epoch and turned into km and km/s in the frame asked for.
//  - icrf-earth: geocentric, EQJ axes (J2000 mean equator and equinox, EME2000); each sample is placed in
//    the instantaneous Earth–Moon frame at its own epoch (core/beyond/rotating-to-inertial-at-epoch.ts,
//    the Moon from moon-state-at.ts), epochs following the Earth–Moon line (epochs-of-model-times.ts).
//  - rotating: the model's own frame (barycentric, x from the Earth to the Moon), scaled by the catalog's
//    mean length and time units; epochs are the start epoch plus model time × time unit (labels only).
import { rotatingToInertialAtEpoch } from '../../core/beyond/rotating-to-inertial-at-epoch.ts';
import { epochsOfModelTimes } from './epochs-of-model-times.ts';
import { earthMoonRateRadS, moonStateAt } from './moon-state-at.ts';

export type ExportFrame = 'icrf-earth' | 'rotating';
export const EXPORT_FRAMES: readonly ExportFrame[] = ['icrf-earth', 'rotating'];

export interface StateSeriesInput {
  mu: number;
  lengthUnitKm: number;
  timeUnitS: number;
  frame: ExportFrame;
  startEpochMs: number;
  timesNd: ArrayLike<number>;
  /** 6 numbers per sample, rotating frame, nondimensional. */
  statesNd: ArrayLike<number>;
}

export interface StateRecord {
  epochMs: number;
  tNd: number;
  positionKm: [number, number, number];
  velocityKmS: [number, number, number];
}

export function stateSeries(input: StateSeriesInput): StateRecord[] {
  const { mu, lengthUnitKm: lu, timeUnitS: tu, frame, startEpochMs, timesNd, statesNd } = input;
  const count = timesNd.length;
  if (statesNd.length !== 6 * count) throw new RangeError(`statesNd must hold 6 numbers per sample (${6 * count}), got ${statesNd.length}`);
  const state = (i: number) => Array.from({ length: 6 }, (_, k) => statesNd[6 * i + k]!);
  const records: StateRecord[] = [];
  if (frame === 'rotating') {
    for (let i = 0; i < count; i++) {
      const s = state(i);
      records.push({
        epochMs: startEpochMs + timesNd[i]! * tu * 1000,
        tNd: timesNd[i]!,
        positionKm: [s[0]! * lu, s[1]! * lu, s[2]! * lu],
        velocityKmS: [(s[3]! * lu) / tu, (s[4]! * lu) / tu, (s[5]! * lu) / tu],
      });
    }
    return records;
  }
  const epochs = epochsOfModelTimes(startEpochMs, timesNd, (ms) => earthMoonRateRadS(moonStateAt(ms)));
  for (let i = 0; i < count; i++) {
    const mapped = rotatingToInertialAtEpoch(state(i), { mu, ...moonStateAt(epochs[i]!) });
    records.push({
      epochMs: epochs[i]!,
      tNd: timesNd[i]!,
      positionKm: [mapped.positionKm[0]!, mapped.positionKm[1]!, mapped.positionKm[2]!],
      velocityKmS: [mapped.velocityKmS[0]!, mapped.velocityKmS[1]!, mapped.velocityKmS[2]!],
    });
  }
  return records;
}
