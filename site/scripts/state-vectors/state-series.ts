// State vectors over a span, in the chosen frame and units, from the generator's own propagator
// (same code, same default tolerance as the catalog runs). The epoch-dated Earth-centred frame is made by
// epoch-dated-series.ts from the same samples.
import { sampleTrajectory, type TrajectorySamples } from '../../../generator/core/propagation/sample-trajectory.ts';
import { rotatingToBodyInertial } from '../../lib/body-inertial-frame.ts';
import type { OrbitDownloadData } from './orbit-download-data.ts';

/** CR3BP model frames, and 'eme2000': Earth-centred inertial at real epochs (epoch-dated-series.ts). */
export type SeriesFrame = 'rotating' | 'primary' | 'secondary' | 'eme2000';
export type SeriesUnits = 'nd' | 'km';

export interface SeriesRequest {
  periods: number; // span in orbital periods
  stepNd: number; // wanted step; adjusted so the span divides evenly
  frame: SeriesFrame;
  units: SeriesUnits;
}

export interface StateSeries {
  request: SeriesRequest;
  count: number;
  stepNd: number; // the step used
  timesNd: Float64Array;
  /** Times in the output units: TU (nd) or seconds (km). */
  times: Float64Array;
  /** 6 per sample, in the output frame and units. */
  states: Float64Array;
  /** Dated series only: the start epoch and each sample's epoch, µs since 1970-01-01T00:00:00 UTC. */
  startMicros?: number;
  epochMicros?: Float64Array;
}

export const DOWNLOAD_TOLERANCE = { rtol: 1e-12, atol: 1e-12 };
export const MAX_SAMPLES = 200_000;

/** Checks a request; throws a one-line error naming the field and the allowed range. */
export function checkRequest(request: Pick<SeriesRequest, 'periods' | 'stepNd'>): void {
  if (!(request.periods > 0 && request.periods <= 1000)) throw new RangeError(`span must be in (0, 1000] periods, got ${request.periods}`);
  if (!(request.stepNd > 0 && Number.isFinite(request.stepNd))) throw new RangeError(`step must be a positive number, got ${request.stepNd}`);
}

export function sampleCountFor(spanNd: number, stepNd: number): number {
  return Math.max(2, Math.round(spanNd / stepNd) + 1);
}

/** Evenly spaced rotating-frame samples over the requested span (the start of every frame's series). */
export function seriesSamples(
  orbit: OrbitDownloadData, request: Pick<SeriesRequest, 'periods' | 'stepNd'>, maxSamples = MAX_SAMPLES,
): { count: number; samples: TrajectorySamples } {
  checkRequest(request);
  const spanNd = request.periods * orbit.periodNd;
  const count = sampleCountFor(spanNd, request.stepNd);
  if (count > maxSamples) {
    throw new RangeError(`step gives ${count} samples; allowed at most ${maxSamples} (choose a larger step or a shorter span)`);
  }
  return { count, samples: sampleTrajectory(orbit.mu, orbit.state0, spanNd, count, DOWNLOAD_TOLERANCE) };
}

export function stateSeries(orbit: OrbitDownloadData, request: SeriesRequest): StateSeries {
  if (request.frame === 'eme2000') throw new RangeError('frame "eme2000" needs a start epoch: use epochDatedSeries');
  const { count, samples } = seriesSamples(orbit, request);
  const spanNd = request.periods * orbit.periodNd;
  const states = new Float64Array(6 * count);
  if (request.frame === 'rotating') states.set(samples.states);
  else {
    for (let i = 0; i < count; i++) {
      rotatingToBodyInertial(orbit.mu, request.frame, samples.timesNd[i], samples.states, 6 * i, states, 6 * i);
    }
  }
  const times = new Float64Array(samples.timesNd);
  if (request.units === 'km') {
    const lu = orbit.lengthUnitKm;
    const vu = orbit.lengthUnitKm / orbit.timeUnitS;
    for (let i = 0; i < count; i++) {
      times[i] *= orbit.timeUnitS;
      for (let k = 0; k < 3; k++) states[6 * i + k] *= lu;
      for (let k = 3; k < 6; k++) states[6 * i + k] *= vu;
    }
  }
  return { request, count, stepNd: spanNd / (count - 1), timesNd: samples.timesNd, times, states };
}

/** The approximation behind the dated frame, in words (OEM comments, JSON, page note). */
export const EME2000_APPROXIMATION =
  'CR3BP rotating states scaled by the instantaneous Earth–Moon distance and rate from the astronomy-engine ephemeris ' +
  '(geocentric Moon at each sample epoch; x toward the Moon, z along its orbital angular momentum); ' +
  'not a solution of an ephemeris model: verify in a high-fidelity model before any use';

export function frameLabel(orbit: OrbitDownloadData, frame: SeriesFrame): string {
  if (frame === 'rotating') return `CR3BP rotating frame (barycentric, x from ${orbit.primaryName} to ${orbit.secondaryName})`;
  if (frame === 'eme2000') return 'Earth-centred inertial, EME2000/J2000 mean equator and equinox, via the instantaneous Earth–Moon geometry';
  const body = frame === 'primary' ? orbit.primaryName : orbit.secondaryName;
  return `CR3BP inertial axes centred on ${body} (coincide with the rotating axes at t = 0)`;
}
