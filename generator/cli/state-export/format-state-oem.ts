// export-state as a CCSDS Orbit Ephemeris Message in KVN form (CCSDS 502.0-B-3): header, one metadata
// block, then one "epoch x y z vx vy vz" line per state in km and km/s. The description's sentences are
// COMMENT lines of the header.
import type { ExportDescription } from './export-description.ts';
import { formatEpochUtc } from './format-epoch.ts';
import type { StateRecord } from './state-series.ts';

/** KVN values are one line of ASCII text: dashes and accents folded, anything else non-ASCII dropped. */
const kvnValue = (text: string) =>
  text.normalize('NFKD').replace(/[\u2010-\u2015\u2212]/g, '-').replace(/[^\u0020-\u007e]+/g, ' ').replace(/\s+/g, ' ').trim() || 'UNNAMED';
/** 16 significant digits: every double reads back to within one unit in the last place. */
const kvnNumber = (value: number) => value.toExponential(15).replace('e', 'E');

export function formatStateOem(description: ExportDescription, records: readonly StateRecord[], creationMs: number): string {
  if (records.length === 0) throw new RangeError('formatStateOem: no states to write');
  const lines = [
    'CCSDS_OEM_VERS = 3.0',
    ...description.comments.map((text) => `COMMENT ${kvnValue(text)}`),
    `CREATION_DATE = ${formatEpochUtc(creationMs)}`,
    'ORIGINATOR = CYCLER-ATLAS',
    '',
    'META_START',
    `OBJECT_NAME = ${kvnValue(`${description.familyName} ${description.orbitId.split('/').pop() ?? ''}`)}`,
    `OBJECT_ID = ${kvnValue(description.orbitId)}`,
    `CENTER_NAME = ${kvnValue(description.centerName)}`,
    `REF_FRAME = ${description.refFrame}`,
    `TIME_SYSTEM = ${description.timeSystem}`,
    `START_TIME = ${formatEpochUtc(records[0]!.epochMs)}`,
    `STOP_TIME = ${formatEpochUtc(records[records.length - 1]!.epochMs)}`,
    'META_STOP',
    '',
  ];
  for (const r of records) {
    lines.push([formatEpochUtc(r.epochMs), ...r.positionKm.map(kvnNumber), ...r.velocityKmS.map(kvnNumber)].join(' '));
  }
  return `${lines.join('\n')}\n`;
}
