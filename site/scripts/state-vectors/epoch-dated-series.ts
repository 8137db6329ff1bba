// Epoch-dated state vectors in Earth-centred inertial axes (EME2000/J2000): the orbit is sampled with the
// generator's own propagator as for the other frames, sample i is dated start + t_i·TU (the catalog's time
// unit), and each rotating state is placed in the instantaneous Earth–Moon frame of that epoch by the
// core's rotatingToInertialAtEpoch (lengths scaled by the Earth–Moon distance, velocities by its rate, from
// the Moon's geocentric state). The Moon comes from a function passed in, so this file stays free of the
// ephemeris library (the page loads that only when this frame is chosen) and tests can pass their own.
import { rotatingToInertialAtEpoch } from '../../../generator/core/beyond/rotating-to-inertial-at-epoch.ts';
import { epochMicrosAfter } from './epoch-text.ts';
import type { OrbitDownloadData } from './orbit-download-data.ts';
import { seriesSamples, type StateSeries } from './state-series.ts';

export interface MoonState {
  moonPositionKm: [number, number, number];
  moonVelocityKmS: [number, number, number];
}

/** Geocentric Moon (km, km/s, EME2000 axes) at an epoch given in µs since 1970-01-01T00:00:00 UTC. */
export type MoonAt = (epochMicros: number) => MoonState;

/** One ephemeris call per sample (~50 µs each in a browser): this keeps a download within a few seconds. */
export const MAX_DATED_SAMPLES = 50_000;

export interface DatedRequest {
  periods: number;
  stepNd: number;
  startMicros: number;
}

export function epochDatedSeries(orbit: OrbitDownloadData, request: DatedRequest, moonAt: MoonAt): StateSeries {
  if (!Number.isFinite(request.startMicros)) throw new RangeError(`start epoch must be a valid date and time, got ${request.startMicros}`);
  const { count, samples } = seriesSamples(orbit, request, MAX_DATED_SAMPLES);
  const times = new Float64Array(count);
  const epochMicros = new Float64Array(count);
  const states = new Float64Array(6 * count);
  for (let i = 0; i < count; i++) {
    times[i] = samples.timesNd[i] * orbit.timeUnitS;
    epochMicros[i] = epochMicrosAfter(request.startMicros, times[i]);
    const mapped = rotatingToInertialAtEpoch(samples.states.subarray(6 * i, 6 * i + 6), { mu: orbit.mu, ...moonAt(epochMicros[i]) });
    states.set(mapped.positionKm, 6 * i);
    states.set(mapped.velocityKmS, 6 * i + 3);
  }
  const spanNd = samples.timesNd[count - 1];
  return {
    request: { periods: request.periods, stepNd: request.stepNd, frame: 'eme2000', units: 'km' },
    count,
    stepNd: spanNd / (count - 1),
    timesNd: samples.timesNd,
    times,
    states,
    startMicros: request.startMicros,
    epochMicros,
  };
}
