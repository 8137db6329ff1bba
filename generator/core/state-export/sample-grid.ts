// When the samples of a state export are taken: epochs on the step asked from the start epoch (a 1 h step
// gives whole hours), and the model time of each.
//
// The epoch rule, one for every frame: model time is the turn of the frame's x-axis, so the model time
// elapsed between two epochs is the integral of the frame's angular rate n over them, t = ∫ n dτ.
//  - Model frames: n = 1 / TU (the catalog's mean time unit), so t = (τ − τ0) / TU.
//  - EME2000: the velocities are scaled by the Earth–Moon line's instantaneous rate (one model time unit
//    at epoch τ lasts 1/n(τ) s), so only t = ∫ n dτ makes the velocities written the time derivative of the
//    positions written. Dating by t · TU instead drifts by up to ~12 h within a month (n varies by ~10 %)
//    and the velocities disagree with the positions by tens of m/s.
// The integral is Simpson's rule on substeps of at most an hour: n changes on the scale of a month, so the
// error is far below a microsecond of model time.
import { earthMoonRateRadS, type MoonAt, type MoonState } from './moon-geometry.ts';
import type { StateFrame } from './state-frames.ts';

const MAX_SUBSTEP_S = 3600;

export interface SampleSpan {
  /** Span in orbital periods, > 0; samples run to the first one at or past it. */
  periods: number;
  stepS: number;
}

export interface SampleGridInput {
  frame: StateFrame;
  periodNd: number;
  timeUnitS: number;
  startEpochMicros: number;
  /** null: the start state alone. */
  span: SampleSpan | null;
  maxSamples: number;
  /** Needed for eme2000 only. */
  moonAt?: MoonAt;
}

export interface SampleGrid {
  epochMicros: Float64Array;
  timesNd: Float64Array;
  /** eme2000: the Moon at each sample epoch (read once, used again by the frame map). */
  moon: MoonState[] | null;
}

export function sampleGrid(input: SampleGridInput): SampleGrid {
  const { frame, span, startEpochMicros, timeUnitS, moonAt } = input;
  if (frame === 'eme2000' && moonAt === undefined) throw new RangeError('frame eme2000 needs the Moon\'s geometry (moonAt)');
  const epochAt = (k: number) => startEpochMicros + Math.round(k * (span?.stepS ?? 0) * 1e6);
  const moonAtEpoch = frame === 'eme2000' ? moonAt! : null;
  const epochs = [startEpochMicros];
  const times = [0];
  const moon = moonAtEpoch ? [moonAtEpoch(startEpochMicros)] : null;
  if (span !== null) {
    const spanNd = span.periods * input.periodNd;
    const estimate = Math.ceil((spanNd * timeUnitS) / span.stepS - 1e-9) + 1;
    if (estimate > input.maxSamples) throw new RangeError(`gives ${estimate} samples, more than ${input.maxSamples} (take a longer step or a shorter span)`);
    let rateThen = moon ? earthMoonRateRadS(moon[0]!) : 1 / timeUnitS;
    for (let k = 1; ; k++) {
      if (k >= input.maxSamples) throw new RangeError(`gives more than ${input.maxSamples} samples (take a longer step or a shorter span)`);
      const epoch = epochAt(k);
      const before = times[k - 1]!;
      let t: number;
      if (moon) {
        const state = moonAtEpoch!(epoch);
        const rateNow = earthMoonRateRadS(state);
        t = before + turnBetween(epochs[k - 1]!, epoch, rateThen, rateNow, (micros) => earthMoonRateRadS(moonAtEpoch!(micros)));
        moon.push(state);
        rateThen = rateNow;
      } else {
        t = (k * span.stepS) / timeUnitS;
      }
      epochs.push(epoch);
      times.push(t);
      if (t >= spanNd - 1e-9 * (t - before)) break;
    }
  }
  return { epochMicros: Float64Array.from(epochs), timesNd: Float64Array.from(times), moon };
}

/** ∫ n dτ from one epoch to the next (µs), Simpson's rule on substeps of at most MAX_SUBSTEP_S. */
function turnBetween(fromMicros: number, toMicros: number, rateFrom: number, rateTo: number, rateAt: (micros: number) => number): number {
  const spanS = (toMicros - fromMicros) / 1e6;
  const substeps = Math.max(1, Math.ceil(spanS / MAX_SUBSTEP_S));
  const hS = spanS / substeps;
  let turn = 0;
  let left = rateFrom;
  for (let j = 0; j < substeps; j++) {
    const right = j === substeps - 1 ? rateTo : rateAt(fromMicros + (j + 1) * hS * 1e6);
    turn += (hS / 6) * (left + 4 * rateAt(fromMicros + (j + 0.5) * hS * 1e6) + right);
    left = right;
  }
  return turn;
}
