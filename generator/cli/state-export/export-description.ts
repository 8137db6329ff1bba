// What every `export-state` output says about itself: the orbit, the frame (with its CCSDS names) and, in
// plain words, the approximation behind the numbers. The same sentences go into the CSV comment lines,
// the JSON "comments" and the OEM COMMENT lines.
import type { ExportFrame } from './state-series.ts';

export interface ExportDescription {
  orbitId: string;
  familyId: string;
  familyName: string;
  systemId: string;
  systemName: string;
  signature: string;
  mu: number;
  lengthUnitKm: number;
  timeUnitS: number;
  periodNd: number;
  periodDays: number;
  frame: ExportFrame;
  /** CCSDS REF_FRAME and CENTER_NAME. */
  refFrame: string;
  centerName: string;
  timeSystem: 'UTC';
  comments: string[];
}

export interface DescribeInput {
  orbitId: string;
  familyId: string;
  familyName: string;
  signature: string;
  system: { id: string; name: string; mu: number; lengthUnitKm: number; timeUnitS: number; primaryName: string; secondaryName: string };
  periodNd: number;
  periodDays: number;
  frame: ExportFrame;
  periods: number;
  stepNd: number | null;
}

export function describeExport(input: DescribeInput): ExportDescription {
  const { system, frame } = input;
  const model = `Orbit ${input.orbitId} (${input.signature}) of the circular restricted three-body problem, ${system.name}, `
    + `mu = ${system.mu}, length unit ${system.lengthUnitKm} km, time unit ${system.timeUnitS} s, period ${input.periodNd} (${input.periodDays} d).`;
  const span = input.periods > 0
    ? `Span ${input.periods} period(s) (to the first sample at or past it) from the orbit's catalog start state, samples every ${input.stepNd} in model time `
      + '(DOP853 dense output, tolerance 1e-12).'
    : 'One state: the orbit\'s catalog start state at the epoch.';
  const comments = frame === 'icrf-earth'
    ? [
        model,
        'APPROXIMATION: this is a CR3BP solution placed in the real sky, not a solution of the real Earth-Moon-Sun dynamics.',
        'Each state is put into the instantaneous Earth-Moon frame at its epoch: x toward the Moon, z along the Moon\'s orbital angular momentum;',
        'lengths scaled by the Earth-Moon distance at that epoch, time by the angular rate of the Earth-Moon line there, with the frame\'s pulsation in the velocity.',
        'Epochs follow that rate (model time = turn of the Earth-Moon line): the step asked is taken at the start epoch\'s rate, so later steps drift with the rate (by up to about 10 % over a month).',
        'Left out: the turning of the Moon\'s orbital plane (velocity errors of order 1 m/s); the Sun, the lunar eccentricity\'s effect on the dynamics, and all other forces.',
        'Moon state from astronomy-engine GeoMoonState (a truncated analytic lunar theory, not a JPL ephemeris), which treats UTC as UT1.',
        'Frame: astronomy-engine EQJ, the J2000 mean equator and equinox, given as EME2000; ICRF differs from it by the frame bias (about 0.02 arcsec).',
        span,
        'Use: a first guess to seed a high-fidelity propagator and a corrector (e.g. multiple shooting) in an ephemeris model; not flight-ready.',
      ]
    : [
        model,
        `APPROXIMATION: states in the model's rotating frame (origin: the ${system.primaryName}-${system.secondaryName} barycentre, x from ${system.primaryName} to ${system.secondaryName}), `
          + `scaled by the catalog's mean length and time units; not an inertial or ephemeris frame.`,
        'Epochs are the start epoch plus model time x time unit: labels only, the CR3BP has no calendar.',
        span,
      ];
  return {
    orbitId: input.orbitId,
    familyId: input.familyId,
    familyName: input.familyName,
    systemId: system.id,
    systemName: system.name,
    signature: input.signature,
    mu: system.mu,
    lengthUnitKm: system.lengthUnitKm,
    timeUnitS: system.timeUnitS,
    periodNd: input.periodNd,
    periodDays: input.periodDays,
    frame,
    refFrame: frame === 'icrf-earth' ? 'EME2000' : 'CR3BP_ROTATING',
    centerName: frame === 'icrf-earth' ? 'EARTH' : `${system.primaryName}-${system.secondaryName} BARYCENTER`.toUpperCase(),
    timeSystem: 'UTC',
    comments,
  };
}
