// export-state as one JSON object: the description (with its comments) and the states.
import type { ExportDescription } from './export-description.ts';
import { formatEpochUtc } from './format-epoch.ts';
import type { StateRecord } from './state-series.ts';

export function formatStateJson(description: ExportDescription, records: readonly StateRecord[]): string {
  const document = {
    ...description,
    units: { position: 'km', velocity: 'km/s', tNd: 'model time (nondimensional)' },
    states: records.map((r) => ({ epochUtc: formatEpochUtc(r.epochMs), tNd: r.tNd, positionKm: r.positionKm, velocityKmS: r.velocityKmS })),
  };
  return `${JSON.stringify(document, null, 2)}\n`;
}
