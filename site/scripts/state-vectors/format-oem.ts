// State vectors as a CCSDS Orbit Ephemeris Message in KVN form (CCSDS 502.0-B-3, ODM version 3):
// header, one metadata block, then "epoch x y z vx vy vz" lines in km and km/s (the units the standard
// requires, whatever units the page asked for). The frame is a model frame of the CR3BP; it is named
// by us and stated in comments, because no ephemeris frame (ICRF, EME2000, ...) applies.
import { formatEpoch, parseEpochMicros } from './epoch-text.ts';
import type { OrbitDownloadData } from './orbit-download-data.ts';
import { DOWNLOAD_TOLERANCE, frameLabel, type StateSeries } from './state-series.ts';

/** KVN values are one line of text: no line breaks or control characters. */
const kvnValue = (text: string) => text.replace(/[\u0000-\u001f\u007f]+/g, ' ').trim() || 'UNNAMED';

export interface OemOptions {
  startEpoch: string; // e.g. 2030-01-01T00:00:00.000 (nominal: the model has no calendar)
  creationDate: string; // ISO without zone
}

export function seriesToOem(orbit: OrbitDownloadData, series: StateSeries, options: OemOptions): string {
  if (series.request.units !== 'km') throw new Error('seriesToOem: series must be in km and km/s (units = "km")');
  const start = parseEpochMicros(options.startEpoch);
  const frame = series.request.frame;
  const centre = frame === 'rotating'
    ? `${orbit.primaryName}-${orbit.secondaryName} BARYCENTER`
    : frame === 'primary' ? orbit.primaryName : orbit.secondaryName;
  const refFrame = frame === 'rotating' ? 'CR3BP_ROTATING' : 'CR3BP_INERTIAL';
  const first = formatEpoch(start, series.times[0]);
  const last = formatEpoch(start, series.times[series.count - 1]);
  const lines = [
    'CCSDS_OEM_VERS = 3.0',
    'COMMENT Made by cycler-atlas in the browser with the catalog generator\'s own propagator (DOP853).',
    `COMMENT REF_FRAME is a CR3BP model frame, not an ephemeris frame: ${kvnValue(frameLabel(orbit, frame))}.`,
    `COMMENT Model: circular restricted three-body problem, mu = ${orbit.mu}, length unit ${orbit.lengthUnitKm} km, time unit ${orbit.timeUnitS} s.`,
    'COMMENT Epochs are model time from a nominal start epoch; the CR3BP has no calendar. Not flight-ready:',
    'COMMENT verify in an ephemeris model and by qualified flight-dynamics practice.',
    `COMMENT Integration tolerance rtol = ${DOWNLOAD_TOLERANCE.rtol}, atol = ${DOWNLOAD_TOLERANCE.atol}; span ${series.request.periods} period(s).`,
    `CREATION_DATE = ${options.creationDate}`,
    'ORIGINATOR = CYCLER-ATLAS',
    '',
    'META_START',
    `OBJECT_NAME = ${kvnValue(`${orbit.familyName} ${orbit.orbitId.split('/').pop() ?? ''}`)}`,
    `OBJECT_ID = ${kvnValue(orbit.orbitId)}`,
    `CENTER_NAME = ${kvnValue(centre.toUpperCase())}`,
    `REF_FRAME = ${refFrame}`,
    'TIME_SYSTEM = TDB',
    `START_TIME = ${first}`,
    `STOP_TIME = ${last}`,
    'META_STOP',
    '',
  ];
  for (let i = 0; i < series.count; i++) {
    const s = series.states;
    const o = 6 * i;
    lines.push(`${formatEpoch(start, series.times[i])} ${s[o]} ${s[o + 1]} ${s[o + 2]} ${s[o + 3]} ${s[o + 4]} ${s[o + 5]}`);
  }
  return `${lines.join('\n')}\n`;
}
