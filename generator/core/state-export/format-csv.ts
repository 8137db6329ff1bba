// A state export as CSV: "#" comment lines (the description), a header with the units in the column
// names (camelCase, as the catalog's CSV), one row per state; records end with CRLF (RFC 4180). Every field is a number or an epoch, so
// none needs quoting.
import { formatEpochMicros } from './epoch-text.ts';
import { describeExport } from './export-description.ts';
import type { StateSeries } from './state-series.ts';
import type { StateUnits } from './state-frames.ts';

function stateCsvColumns(units: StateUnits): string[] {
  const state = units === 'km'
    ? ['xKm', 'yKm', 'zKm', 'vxKmS', 'vyKmS', 'vzKmS']
    : ['xLu', 'yLu', 'zLu', 'vxLuTu', 'vyLuTu', 'vzLuTu'];
  return ['epochUtc', 'tNd', ...state];
}

export function formatStateCsv(series: StateSeries): string {
  const description = describeExport(series);
  const head = [
    `cycler-atlas state export: ${series.orbit.orbitId}, frame ${series.request.frame} (${description.refFrame}, centre ${description.centerName})`,
    ...description.comments,
  ].map((line) => `# ${line}\r\n`);
  const rows = [stateCsvColumns(series.request.units).join(',')];
  for (let i = 0; i < series.count; i++) {
    rows.push([formatEpochMicros(series.epochMicros[i]!), series.timesNd[i]!, ...series.states.subarray(6 * i, 6 * i + 6)].join(','));
  }
  return `${head.join('')}${rows.join('\r\n')}\r\n`;
}
