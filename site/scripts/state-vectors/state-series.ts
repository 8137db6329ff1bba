// State vectors over a span, in the chosen frame and units, from the generator's own propagator
// (same code, same default tolerance as the catalog runs).
import { sampleTrajectory } from '../../../generator/core/propagation/sample-trajectory.ts';
import { rotatingToBodyInertial } from '../../lib/body-inertial-frame.ts';
import type { OrbitDownloadData } from './orbit-download-data.ts';

export type SeriesFrame = 'rotating' | 'primary' | 'secondary';
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
}

export const DOWNLOAD_TOLERANCE = { rtol: 1e-12, atol: 1e-12 };
export const MAX_SAMPLES = 200_000;

/** Checks a request; throws a one-line error naming the field and the allowed range. */
export function checkRequest(request: SeriesRequest): void {
  if (!(request.periods > 0 && request.periods <= 1000)) throw new RangeError(`span must be in (0, 1000] periods, got ${request.periods}`);
  if (!(request.stepNd > 0 && Number.isFinite(request.stepNd))) throw new RangeError(`step must be a positive number, got ${request.stepNd}`);
}

export function sampleCountFor(spanNd: number, stepNd: number): number {
  return Math.max(2, Math.round(spanNd / stepNd) + 1);
}

export function stateSeries(orbit: OrbitDownloadData, request: SeriesRequest): StateSeries {
  checkRequest(request);
  const spanNd = request.periods * orbit.periodNd;
  const count = sampleCountFor(spanNd, request.stepNd);
  if (count > MAX_SAMPLES) {
    throw new RangeError(`step gives ${count} samples; allowed at most ${MAX_SAMPLES} (choose a larger step or a shorter span)`);
  }
  const samples = sampleTrajectory(orbit.mu, orbit.state0, spanNd, count, DOWNLOAD_TOLERANCE);
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

export function frameLabel(orbit: OrbitDownloadData, frame: SeriesFrame): string {
  if (frame === 'rotating') return `CR3BP rotating frame (barycentric, x from ${orbit.primaryName} to ${orbit.secondaryName})`;
  const body = frame === 'primary' ? orbit.primaryName : orbit.secondaryName;
  return `CR3BP inertial axes centred on ${body} (coincide with the rotating axes at t = 0)`;
}
