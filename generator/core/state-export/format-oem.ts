// A state export as a CCSDS Orbit Ephemeris Message in KVN form (CCSDS 502.0-B-3): header, one metadata
// block, then one "epoch x y z vx vy vz" line per state in km and km/s (the units the standard requires).
// The description's sentences are COMMENT lines of the header.
import { formatEpochMicros } from './epoch-text.ts';
import { describeExport } from './export-description.ts';
import type { StateSeries } from './state-series.ts';

/** KVN values are one line of ASCII text: dashes and accents folded, anything else non-ASCII dropped. */
const kvnValue = (text: string) =>
  text.normalize('NFKD').replace(/[\u2010-\u2015\u2212]/g, '-').replace(/[^\u0020-\u007e]+/g, ' ').replace(/\s+/g, ' ').trim() || 'UNNAMED';
/** The shortest text that reads back as the same double, exponent letter as E. */
const kvnNumber = (value: number) => String(value).replace('e', 'E');

export function formatStateOem(series: StateSeries, creationEpochMicros: number): string {
  if (series.request.units !== 'km') throw new RangeError('units: an OEM is written in km and km/s only');
  const { orbit, count, epochMicros, states } = series;
  const description = describeExport(series);
  const lines = [
    'CCSDS_OEM_VERS = 3.0',
    ...description.comments.map((text) => `COMMENT ${kvnValue(text)}`),
    `CREATION_DATE = ${formatEpochMicros(Math.round(creationEpochMicros))}`,
    'ORIGINATOR = CYCLER-ATLAS',
    '',
    'META_START',
    `OBJECT_NAME = ${kvnValue(`${orbit.familyName} ${orbit.seq}`)}`,
    `OBJECT_ID = ${kvnValue(orbit.orbitId)}`,
    `CENTER_NAME = ${kvnValue(description.centerName)}`,
    `REF_FRAME = ${description.refFrame}`,
    `TIME_SYSTEM = ${description.timeSystem}`,
    `START_TIME = ${formatEpochMicros(epochMicros[0]!)}`,
    `STOP_TIME = ${formatEpochMicros(epochMicros[count - 1]!)}`,
    'META_STOP',
    '',
  ];
  for (let i = 0; i < count; i++) {
    lines.push([formatEpochMicros(epochMicros[i]!), ...Array.from(states.subarray(6 * i, 6 * i + 6), kvnNumber)].join(' '));
  }
  return `${lines.join('\n')}\n`;
}
