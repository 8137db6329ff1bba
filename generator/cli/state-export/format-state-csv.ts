// export-state as CSV: "#" comment lines (the description), a header, one row per state (RFC 4180 rows).
import { formatCsvRecord } from '../../../catalog-db/csv-field.ts';
import type { ExportDescription } from './export-description.ts';
import { formatEpochUtc } from './format-epoch.ts';
import type { StateRecord } from './state-series.ts';

export const STATE_CSV_HEADER = ['epochUtc', 'tNd', 'xKm', 'yKm', 'zKm', 'vxKmS', 'vyKmS', 'vzKmS'] as const;

export function formatStateCsv(description: ExportDescription, records: readonly StateRecord[]): string {
  const head = [
    `cycler-atlas export-state: ${description.orbitId}, frame ${description.frame} (${description.refFrame}, centre ${description.centerName}), `
      + `epochs ${description.timeSystem}, km and km/s`,
    ...description.comments,
  ].map((line) => `# ${line}\r\n`);
  const rows = records.map((r) => formatCsvRecord([formatEpochUtc(r.epochMs), r.tNd, ...r.positionKm, ...r.velocityKmS]));
  return [...head, formatCsvRecord([...STATE_CSV_HEADER]), ...rows].join('');
}
