// A stability index (in-plane ν or vertical ν_z) against minimum altitude above the smaller body, symlog y
// (indices span 1e-1 to 1e8), with the |index| < 1 band, the bifurcations of that plane (tangent at +1,
// period doubling at −1) and, for the in-plane index, the stable windows.
import { altitudeChannel } from './altitude-channel.ts';
import type { ChartClasses } from './chart-classes.ts';
import type { FamilyChartInput } from './chart-input.ts';
import { SYMLOG_LABEL_EXPR, indexAxis } from './chart-style.ts';
import { familyChartSpec } from './family-chart-spec.ts';
import { bandLayer, bifurcationLayer, familyLineLayer, memberLayer, windowLayer, type Channel } from './family-chart-layers.ts';

const PLANES = {
  'in-plane': { field: 'nu', title: 'in-plane index ν (symlog scale)' },
  vertical: { field: 'nuV', title: 'vertical index ν_z (symlog scale)' },
} as const;

export function indexAltitudeChart(input: FamilyChartInput, description: string, classes: ChartClasses) {
  const plane = classes.plane;
  const { field, title } = PLANES[plane];
  const indexOf = (m: FamilyChartInput['members'][number]) => m[field];
  const x = altitudeChannel(input);
  const axis = indexAxis(input.members.map(indexOf));
  const y: Channel = {
    field,
    title,
    // Domain from the data (and the ±1 band), padded a few pixels so no point sits on the frame.
    scale: { type: 'symlog', constant: 1, domain: axis.domain, nice: false, padding: 8 },
    axis: { values: axis.ticks, labelExpr: SYMLOG_LABEL_EXPR },
  };
  const windows = plane === 'in-plane' ? input.windows : [];
  return familyChartSpec(description, [
    bandLayer(y),
    windows.length > 0 ? windowLayer(windows, x, 'fromAltKm', 'toAltKm') : null,
    familyLineLayer(input.members, x, y),
    memberLayer(input.members, x, y, classes, input.secondaryName),
    bifurcationLayer(input.bifurcations, 'altKm', x, y, (b) => (b.kind === 'tangent' ? 1 : -1), classes),
  ]);
}
