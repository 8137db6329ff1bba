// State vectors as CSV: one header line with units in the column names, then one line per sample.
// Dated series (Earth-centred EME2000) lead with the UTC epoch of each sample.
import { formatEpochMicros } from './epoch-text.ts';
import type { StateSeries } from './state-series.ts';

export function seriesColumns(units: 'nd' | 'km', dated = false): string[] {
  const columns = units === 'km'
    ? ['t_s', 'x_km', 'y_km', 'z_km', 'vx_km_s', 'vy_km_s', 'vz_km_s']
    : ['t_tu', 'x_lu', 'y_lu', 'z_lu', 'vx_lu_tu', 'vy_lu_tu', 'vz_lu_tu'];
  return dated ? ['epoch_utc', ...columns] : columns;
}

export function seriesToCsv(series: StateSeries): string {
  const epochs = series.epochMicros;
  const lines = [seriesColumns(series.request.units, epochs !== undefined).join(',')];
  for (let i = 0; i < series.count; i++) {
    const row: Array<string | number> = epochs ? [formatEpochMicros(epochs[i]), series.times[i]] : [series.times[i]];
    for (let k = 0; k < 6; k++) row.push(series.states[6 * i + k]);
    lines.push(row.map(String).join(','));
  }
  return `${lines.join('\n')}\n`;
}
