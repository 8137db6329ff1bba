// State vectors as JSON: the orbit, frame, units and tolerance, then times and states as arrays.
import type { OrbitDownloadData } from './orbit-download-data.ts';
import { DOWNLOAD_TOLERANCE, frameLabel, type StateSeries } from './state-series.ts';
import { seriesColumns } from './format-csv.ts';

export function seriesToJson(orbit: OrbitDownloadData, series: StateSeries): string {
  const states: number[][] = [];
  for (let i = 0; i < series.count; i++) states.push(Array.from(series.states.subarray(6 * i, 6 * i + 6)));
  return JSON.stringify({
    orbitId: orbit.orbitId,
    family: orbit.familyName,
    system: orbit.systemName,
    model: 'circular restricted three-body problem (not an ephemeris model)',
    mu: orbit.mu,
    lengthUnitKm: orbit.lengthUnitKm,
    timeUnitS: orbit.timeUnitS,
    frame: frameLabel(orbit, series.request.frame),
    units: series.request.units === 'km' ? 'km, km/s, s' : 'nondimensional (LU, LU/TU, TU)',
    columns: seriesColumns(series.request.units),
    periods: series.request.periods,
    stepNd: series.stepNd,
    tolerance: DOWNLOAD_TOLERANCE,
    times: Array.from(series.times),
    states,
  });
}
