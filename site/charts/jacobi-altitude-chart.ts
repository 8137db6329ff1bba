// Jacobi constant C against minimum altitude above the smaller body, stable windows shaded.
import { altitudeChannel } from './altitude-channel.ts';
import type { ChartClasses } from './chart-classes.ts';
import type { FamilyChartInput } from './chart-input.ts';
import { familyChartSpec } from './family-chart-spec.ts';
import { bifurcationLayer, familyLineLayer, memberLayer, windowLayer, type Channel } from './family-chart-layers.ts';

export function jacobiAltitudeChart(input: FamilyChartInput, description: string, classes: ChartClasses) {
  const x = altitudeChannel(input);
  const y: Channel = {
    field: 'jacobi',
    title: 'Jacobi constant C (nondim.)',
    scale: { type: 'linear', zero: false },
    axis: { format: '.4~f' },
  };
  return familyChartSpec(description, [
    input.windows.length > 0 ? windowLayer(input.windows, x, 'fromAltKm', 'toAltKm') : null,
    familyLineLayer(input.members, x, y),
    memberLayer(input.members, x, y, classes, input.secondaryName),
    bifurcationLayer(input.bifurcations, 'altKm', x, y, (b) => b.jacobi, classes),
  ]);
}
