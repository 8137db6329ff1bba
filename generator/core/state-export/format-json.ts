// A state export as one JSON object: the orbit, the frame with its CCSDS names, the units, the
// description's comments, then one object per state (units in the key names).
import { formatEpochMicros } from './epoch-text.ts';
import { describeExport } from './export-description.ts';
import type { StateSeries } from './state-series.ts';

export function formatStateJson(series: StateSeries): string {
  const { orbit, request } = series;
  const { comments, ...names } = describeExport(series);
  const [position, velocity] = request.units === 'km' ? ['positionKm', 'velocityKmS'] : ['positionLu', 'velocityLuTu'];
  const states = [];
  for (let i = 0; i < series.count; i++) {
    const s = Array.from(series.states.subarray(6 * i, 6 * i + 6));
    states.push({ epochUtc: formatEpochMicros(series.epochMicros[i]!), tNd: series.timesNd[i]!, [position!]: s.slice(0, 3), [velocity!]: s.slice(3) });
  }
  const document = {
    ...orbit,
    frame: request.frame,
    units: request.units,
    ...names,
    startEpochUtc: formatEpochMicros(request.startEpochMicros),
    span: request.span,
    comments,
    states,
  };
  return `${JSON.stringify(document, null, 2)}\n`;
}
