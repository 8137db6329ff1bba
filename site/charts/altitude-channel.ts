// The x axis shared by three family charts: minimum altitude above the smaller body, in km.
import type { FamilyChartInput } from './chart-input.ts';
import { positiveAxisScale } from './chart-style.ts';
import type { Channel } from './family-chart-layers.ts';

export function altitudeChannel(input: FamilyChartInput): Channel {
  const values = [
    ...input.members.map((m) => m.altKm),
    ...input.windows.flatMap((w) => [w.fromAltKm, w.toAltKm]),
  ];
  const scale = positiveAxisScale(values);
  return {
    field: 'altKm',
    title: `minimum altitude above ${input.secondaryName} (km)`,
    scale,
    axis: { format: '~s', labelFlush: true },
  };
}
