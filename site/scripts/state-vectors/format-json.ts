// State vectors as JSON: the orbit, frame, units and tolerance, then times and states as arrays
// (dated series add the start epoch, each sample's UTC epoch and the approximation in words).
import { formatEpochMicros } from './epoch-text.ts';
import type { OrbitDownloadData } from './orbit-download-data.ts';
import { DOWNLOAD_TOLERANCE, EME2000_APPROXIMATION, frameLabel, type StateSeries } from './state-series.ts';
import { seriesColumns } from './format-csv.ts';

export function seriesToJson(orbit: OrbitDownloadData, series: StateSeries): string {
  const states: number[][] = [];
  for (let i = 0; i < series.count; i++) states.push(Array.from(series.states.subarray(6 * i, 6 * i + 6)));
  const epochs = series.epochMicros;
  const dated = epochs !== undefined && series.startMicros !== undefined
    ? {
      refFrame: 'EME2000',
      centerName: 'EARTH',
      timeSystem: 'UTC',
      startEpoch: formatEpochMicros(series.startMicros),
      approximation: EME2000_APPROXIMATION,
      epochs: Array.from(epochs, formatEpochMicros),
    }
    : {};
  return JSON.stringify({
    orbitId: orbit.orbitId,
    family: orbit.familyName,
    system: orbit.systemName,
    model: 'circular restricted three-body problem (not an ephemeris model)',
    mu: orbit.mu,
    lengthUnitKm: orbit.lengthUnitKm,
    timeUnitS: orbit.timeUnitS,
    frame: frameLabel(orbit, series.request.frame),
    ...dated,
    units: series.request.units === 'km' ? 'km, km/s, s' : 'nondimensional (LU, LU/TU, TU)',
    columns: seriesColumns(series.request.units).filter((c) => c !== 'epoch_utc'),
    periods: series.request.periods,
    stepNd: series.stepNd,
    tolerance: DOWNLOAD_TOLERANCE,
    times: Array.from(series.times),
    states,
  });
}
