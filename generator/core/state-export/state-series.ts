// The states of a state export: a catalog orbit sampled in the CR3BP by the generator's own propagator,
// dated by sample-grid.ts and turned into the frame and units asked for.
//  - rotating: the model's frame as it is;
//  - inertial-primary / inertial-secondary: inertial axes about one body (body-inertial-frame.ts);
//  - eme2000: geocentric EME2000, each sample placed in the instantaneous Earth–Moon frame of its epoch
//    (core/beyond/rotating-to-inertial-at-epoch.ts), always in km and km/s.
import { rotatingToInertialAtEpoch } from '../beyond/rotating-to-inertial-at-epoch.ts';
import { sampleTrajectoryAt } from '../propagation/sample-trajectory.ts';
import { rotatingToBodyInertial } from './body-inertial-frame.ts';
import type { ExportOrbit } from './export-orbit.ts';
import type { MoonAt } from './moon-geometry.ts';
import { withPortableMath } from './portable-math.ts';
import { sampleGrid, type SampleSpan } from './sample-grid.ts';
import type { StateFrame, StateUnits } from './state-frames.ts';

/** Model frames. */
const MAX_SAMPLES = 200_000;
/** EME2000 reads the ephemeris about three times per sample (~50 µs each in a browser). */
export const MAX_DATED_SAMPLES = 50_000;

export interface StateRequest {
  frame: StateFrame;
  units: StateUnits;
  startEpochMicros: number;
  /** null: the start state alone. */
  span: SampleSpan | null;
}

export interface StateSeries {
  orbit: ExportOrbit;
  request: StateRequest;
  count: number;
  /** Integer microseconds since 1970-01-01T00:00:00 UTC. */
  epochMicros: Float64Array;
  timesNd: Float64Array;
  /** 6 per sample, in the request's frame and units. */
  states: Float64Array;
}

/** Under portable math (portable-math.ts): the same series, bit for bit, in Node and in a browser. */
export function stateSeries(orbit: ExportOrbit, request: StateRequest, moonAt?: MoonAt): StateSeries {
  return withPortableMath(() => computeSeries(orbit, request, moonAt));
}

function computeSeries(orbit: ExportOrbit, request: StateRequest, moonAt?: MoonAt): StateSeries {
  const { frame, units } = request;
  if (frame === 'eme2000' && units !== 'km') throw new RangeError('units: the EME2000 frame is written in km and km/s only');
  if (!Number.isFinite(request.startEpochMicros)) throw new RangeError(`start epoch must be a date and time, got ${request.startEpochMicros}`);
  const grid = sampleGrid({
    frame, periodNd: orbit.periodNd, timeUnitS: orbit.timeUnitS, startEpochMicros: request.startEpochMicros, span: request.span,
    maxSamples: frame === 'eme2000' ? MAX_DATED_SAMPLES : MAX_SAMPLES, moonAt,
  });
  const count = grid.timesNd.length;
  const rotating = count > 1 ? sampleTrajectoryAt(orbit.mu, orbit.state0, grid.timesNd, orbit.tolerance).states : Float64Array.from(orbit.state0);
  const states = new Float64Array(6 * count);
  for (let i = 0; i < count; i++) {
    const o = 6 * i;
    if (frame === 'rotating') states.set(rotating.subarray(o, o + 6), o);
    else if (frame === 'eme2000') {
      const mapped = rotatingToInertialAtEpoch(rotating.subarray(o, o + 6), { mu: orbit.mu, ...grid.moon![i]! });
      states.set(mapped.positionKm, o);
      states.set(mapped.velocityKmS, o + 3);
    } else {
      rotatingToBodyInertial(orbit.mu, frame === 'inertial-primary' ? 'primary' : 'secondary', grid.timesNd[i]!, rotating, o, states, o);
    }
  }
  if (frame !== 'eme2000' && units === 'km') {
    const speedKmS = orbit.lengthUnitKm / orbit.timeUnitS;
    for (let i = 0; i < count; i++) {
      for (let k = 0; k < 3; k++) states[6 * i + k]! *= orbit.lengthUnitKm;
      for (let k = 3; k < 6; k++) states[6 * i + k]! *= speedKmS;
    }
  }
  return { orbit, request, count, epochMicros: grid.epochMicros, timesNd: grid.timesNd, states };
}
