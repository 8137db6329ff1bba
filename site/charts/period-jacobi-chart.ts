// Period in days against the Jacobi constant, stable windows shaded over their C range.
import type { ChartClasses } from './chart-classes.ts';
import type { FamilyChartInput } from './chart-input.ts';
import { familyChartSpec } from './family-chart-spec.ts';
import { bifurcationLayer, familyLineLayer, memberLayer, windowLayer, type Channel } from './family-chart-layers.ts';

export function periodJacobiChart(input: FamilyChartInput, description: string, classes: ChartClasses) {
  const x: Channel = {
    field: 'jacobi',
    title: 'Jacobi constant C (nondim.)',
    scale: { type: 'linear', zero: false },
    // few ticks, and vega drops labels that would overlap (long C labels collided)
    axis: { format: '.4~f', tickCount: 5, labelOverlap: 'greedy', labelFlush: true },
  };
  const y: Channel = {
    field: 'periodDays',
    title: 'period (days)',
    scale: { type: 'linear', zero: false, padding: 8 },
    axis: { tickCount: 6, labelOverlap: 'greedy' },
  };
  return familyChartSpec(description, [
    input.windows.length > 0 ? windowLayer(input.windows, x, 'fromJacobi', 'toJacobi') : null,
    familyLineLayer(input.members, x, y),
    memberLayer(input.members, x, y, classes, input.secondaryName),
    bifurcationLayer(input.bifurcations, 'jacobi', x, y, (b) => b.periodDays, classes),
  ]);
}
