// The four charts of a family page, in page order: key, heading, spec and text alternative.
import type { FamilyChartInput } from './chart-input.ts';
import { jacobiChartText, periodChartText, stabilityChartText, verticalChartText } from './chart-text.ts';
import { jacobiAltitudeChart } from './jacobi-altitude-chart.ts';
import { periodJacobiChart } from './period-jacobi-chart.ts';
import { indexAltitudeChart } from './index-altitude-chart.ts';
import { holdRadiusChart } from './hold-radius-chart.ts';
import type { HoldRadiusChartInput } from './hold-radius-input.ts';
import { holdRadiusChartText } from './hold-radius-text.ts';

export type FamilyChartKey = 'stability' | 'jacobi' | 'period' | 'vertical' | 'hold';

export interface FamilyChartSpec {
  key: FamilyChartKey;
  heading: string;
  text: string;
  spec: Record<string, unknown>;
}

export function familyChartSpecs(input: FamilyChartInput): FamilyChartSpec[] {
  const stabilityText = stabilityChartText(input);
  const jacobiText = jacobiChartText(input);
  const periodText = periodChartText(input);
  const verticalText = verticalChartText(input);
  return [
    { key: 'stability', heading: 'In-plane stability index ν', text: stabilityText, spec: indexAltitudeChart(input, stabilityText, 'in-plane') },
    { key: 'jacobi', heading: 'Jacobi constant', text: jacobiText, spec: jacobiAltitudeChart(input, jacobiText) },
    { key: 'period', heading: 'Period', text: periodText, spec: periodJacobiChart(input, periodText) },
    { key: 'vertical', heading: 'Vertical stability index ν_z', text: verticalText, spec: indexAltitudeChart(input, verticalText, 'vertical') },
  ];
}

/** The hold-radius chart of a family with screened members. */
export function holdRadiusChartSpec(input: HoldRadiusChartInput): FamilyChartSpec {
  const text = holdRadiusChartText(input);
  return { key: 'hold', heading: 'Hold radius across the stable windows', text, spec: holdRadiusChart(input, text) };
}
