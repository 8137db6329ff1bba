// What every state export says about itself: the orbit, the frame with its CCSDS names, the units and, in
// plain words, the approximation behind the numbers. The same sentences go into the OEM COMMENT lines,
// the CSV "#" lines, the JSON "comments" and the orbit page's note (written in ASCII, as KVN wants).
import { frameNames, type StateFrame } from './state-frames.ts';
import type { StateSeries } from './state-series.ts';

export interface ExportDescription {
  refFrame: string;
  centerName: string;
  /** The start epoch is read as UTC, so every epoch written is UTC. */
  timeSystem: 'UTC';
  positionUnit: 'km' | 'LU';
  velocityUnit: 'km/s' | 'LU/TU';
  comments: string[];
}

/** The approximation of a frame, in sentences. */
export function approximationText(frame: StateFrame): string[] {
  if (frame === 'eme2000') {
    return [
      'APPROXIMATION: a CR3BP solution placed in the real sky, not a solution of the real Earth-Moon-Sun dynamics.',
      'Each state is put into the instantaneous Earth-Moon frame at its epoch: x toward the Moon, z along the Moon\'s orbital angular momentum;'
        + ' lengths scaled by the Earth-Moon distance at that epoch, velocities by the angular rate of the Earth-Moon line there, with the frame\'s pulsation.',
      'Model time between two epochs is the turn of the Earth-Moon line between them (the integral of its rate), so the velocities are the time derivative of the positions.',
      'Left out: the turning of the Moon\'s orbital plane (velocity errors of order 1 m/s); the Sun, the lunar eccentricity\'s effect on the dynamics, and all other forces.',
      'Moon state from astronomy-engine GeoMoonState (a truncated analytic lunar theory, not a JPL ephemeris), which treats UTC as UT1.',
      'EME2000 here is astronomy-engine\'s EQJ (J2000 mean equator and equinox); ICRF differs from it by the frame bias (about 0.02 arcsec).',
      'Use: a first guess to seed a high-fidelity propagator and a corrector in an ephemeris model; not flight-ready.',
    ];
  }
  return [
    'APPROXIMATION: states in a CR3BP model frame, scaled by the catalog\'s mean length and time units; not an inertial or ephemeris frame of the real sky.',
    'Epochs are the start epoch plus model time x time unit: labels only, the CR3BP has no calendar.',
    'Not flight-ready: verify in an ephemeris model and by qualified flight-dynamics practice.',
  ];
}

export function describeExport(series: StateSeries): ExportDescription {
  const { orbit, request } = series;
  const names = frameNames(orbit, request.frame);
  const km = request.units === 'km';
  const periodDays = (orbit.periodNd * orbit.timeUnitS) / 86400;
  const span = request.span === null
    ? 'One state: the orbit\'s catalog start state at the start epoch.'
    : `Samples every ${request.span.stepS} s from the start epoch over ${request.span.periods} period(s), to the first at or past the end;`
      + ` the generator's DOP853 with dense output, tolerance rtol ${orbit.tolerance.rtol}, atol ${orbit.tolerance.atol} (the catalog run's).`;
  return {
    refFrame: names.refFrame,
    centerName: names.centerName,
    timeSystem: 'UTC',
    positionUnit: km ? 'km' : 'LU',
    velocityUnit: km ? 'km/s' : 'LU/TU',
    comments: [
      `Orbit ${orbit.orbitId} (${orbit.signature}) of the circular restricted three-body problem, ${orbit.systemName}, mu = ${orbit.mu},`
        + ` length unit ${orbit.lengthUnitKm} km, time unit ${orbit.timeUnitS} s, period ${orbit.periodNd} TU (${periodDays} d).`,
      `Frame: ${names.label}; positions in ${km ? 'km' : 'LU'}, velocities in ${km ? 'km/s' : 'LU/TU'}; epochs in UTC.`,
      ...approximationText(request.frame),
      span,
    ],
  };
}
