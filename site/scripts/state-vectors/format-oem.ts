// State vectors as a CCSDS Orbit Ephemeris Message in KVN form (CCSDS 502.0-B-3, ODM version 3):
// header, one metadata block, then "epoch x y z vx vy vz" lines in km and km/s (the units the standard
// requires, whatever units the page asked for).
// CR3BP model frames are named by us and explained in comments (no ephemeris frame applies; epochs are a
// nominal model time). The epoch-dated Earth-centred series is written with REF_FRAME = EME2000,
// CENTER_NAME = EARTH and TIME_SYSTEM = UTC, with comments stating how it was made and its approximation.
import { formatEpoch, formatEpochMicros, parseEpochMicros } from './epoch-text.ts';
import type { OrbitDownloadData } from './orbit-download-data.ts';
import { DOWNLOAD_TOLERANCE, frameLabel, type StateSeries } from './state-series.ts';

/** KVN values are one line of text: no line breaks or control characters. */
const kvnValue = (text: string) => text.replace(/[\u0000-\u001f\u007f]+/g, ' ').trim() || 'UNNAMED';

export interface OemOptions {
  startEpoch: string; // e.g. 2030-01-01T00:00:00.000 (nominal for the model frames, UTC for EME2000)
  creationDate: string; // ISO without zone
}

function modelFrameHeader(orbit: OrbitDownloadData, series: StateSeries) {
  const frame = series.request.frame;
  return {
    centre: frame === 'rotating'
      ? `${orbit.primaryName}-${orbit.secondaryName} BARYCENTER`
      : frame === 'primary' ? orbit.primaryName : orbit.secondaryName,
    refFrame: frame === 'rotating' ? 'CR3BP_ROTATING' : 'CR3BP_INERTIAL',
    timeSystem: 'TDB',
    comments: [
      `REF_FRAME is a CR3BP model frame, not an ephemeris frame: ${kvnValue(frameLabel(orbit, frame))}.`,
      `Model: circular restricted three-body problem, mu = ${orbit.mu}, length unit ${orbit.lengthUnitKm} km, time unit ${orbit.timeUnitS} s.`,
      'Epochs are model time from a nominal start epoch; the CR3BP has no calendar. Not flight-ready:',
      'verify in an ephemeris model and by qualified flight-dynamics practice.',
    ],
  };
}

function datedFrameHeader(orbit: OrbitDownloadData) {
  return {
    centre: 'EARTH',
    refFrame: 'EME2000',
    timeSystem: 'UTC',
    comments: [
      'APPROXIMATION: CR3BP rotating states scaled by the instantaneous Earth-Moon distance and rate',
      'from the astronomy-engine ephemeris (geocentric Moon at each sample epoch, J2000 mean equator',
      'and equinox): x toward the Moon, z along the Moon\'s orbital angular momentum, lengths times the',
      'Earth-Moon distance, velocities including its rate of change. This is not a solution of an',
      'ephemeris model: re-converge and verify in a high-fidelity model before any use.',
      `Model: circular restricted three-body problem, mu = ${orbit.mu}; sample epoch = start + t * ${orbit.timeUnitS} s (t in TU).`,
    ],
  };
}

export function seriesToOem(orbit: OrbitDownloadData, series: StateSeries, options: OemOptions): string {
  if (series.request.units !== 'km') throw new Error('seriesToOem: series must be in km and km/s (units = "km")');
  const dated = series.request.frame === 'eme2000';
  if (dated && (series.epochMicros === undefined || series.startMicros === undefined)) {
    throw new Error('seriesToOem: an EME2000 series must carry its epochs (make it with epochDatedSeries)');
  }
  const start = dated ? series.startMicros! : parseEpochMicros(options.startEpoch);
  const epochText = (i: number) => (dated ? formatEpochMicros(series.epochMicros![i]) : formatEpoch(start, series.times[i]));
  const header = dated ? datedFrameHeader(orbit) : modelFrameHeader(orbit, series);
  const lines = [
    'CCSDS_OEM_VERS = 3.0',
    'COMMENT Made by cycler-atlas in the browser with the catalog generator\'s own propagator (DOP853).',
    ...header.comments.map((c) => `COMMENT ${c}`),
    `COMMENT Integration tolerance rtol = ${DOWNLOAD_TOLERANCE.rtol}, atol = ${DOWNLOAD_TOLERANCE.atol}; span ${series.request.periods} period(s).`,
    `CREATION_DATE = ${options.creationDate}`,
    'ORIGINATOR = CYCLER-ATLAS',
    '',
    'META_START',
    `OBJECT_NAME = ${kvnValue(`${orbit.familyName} ${orbit.orbitId.split('/').pop() ?? ''}`)}`,
    `OBJECT_ID = ${kvnValue(orbit.orbitId)}`,
    `CENTER_NAME = ${kvnValue(header.centre.toUpperCase())}`,
    `REF_FRAME = ${header.refFrame}`,
    `TIME_SYSTEM = ${header.timeSystem}`,
    `START_TIME = ${epochText(0)}`,
    `STOP_TIME = ${epochText(series.count - 1)}`,
    'META_STOP',
    '',
  ];
  for (let i = 0; i < series.count; i++) {
    const s = series.states;
    const o = 6 * i;
    lines.push(`${epochText(i)} ${s[o]} ${s[o + 1]} ${s[o + 2]} ${s[o + 3]} ${s[o + 4]} ${s[o + 5]}`);
  }
  return `${lines.join('\n')}\n`;
}
