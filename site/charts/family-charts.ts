// The four charts of a family page, in page order: key, heading, spec and text alternative.
import { chartClasses, classLegendText, type ChartClasses } from './chart-classes.ts';
import type { FamilyChartInput } from './chart-input.ts';
import { jacobiChartText, periodChartText, stabilityChartText, verticalChartText, windowZoomText } from './chart-text.ts';
import { jacobiAltitudeChart } from './jacobi-altitude-chart.ts';
import { windowZoomChart } from './window-zoom-chart.ts';
import { periodJacobiChart } from './period-jacobi-chart.ts';
import { indexAltitudeChart } from './index-altitude-chart.ts';
import { holdRadiusChart } from './hold-radius-chart.ts';
import type { HoldRadiusChartInput } from './hold-radius-input.ts';
import { holdRadiusChartText } from './hold-radius-text.ts';

export type FamilyChartKey = 'stability' | 'windows' | 'jacobi' | 'period' | 'vertical' | 'hold';

export interface FamilyChartSpec {
  key: FamilyChartKey;
  heading: string;
  text: string;
  /** What the chart's colours and shapes mean (shown with it). */
  legend: string;
  spec: Record<string, unknown>;
}

export function familyChartSpecs(input: FamilyChartInput): FamilyChartSpec[] {
  const stabilityText = stabilityChartText(input);
  const jacobiText = jacobiChartText(input);
  const periodText = periodChartText(input);
  const verticalText = verticalChartText(input);
  const inPlane = chartClasses('in-plane', 'same');
  const vertical = chartClasses('vertical', 'same');
  const inPlaneAll = chartClasses('in-plane', 'all');
  const windows = input.windows.length > 0;
  const legend = (classes: ChartClasses, band: boolean, withWindows: boolean) =>
    classLegendText(classes, { band, windows: withWindows, bifurcations: input.bifurcations.some(classes.showsBifurcation) });
  return [
    {
      key: 'stability', heading: 'In-plane stability index ν', text: stabilityText, legend: legend(inPlane, true, windows),
      spec: indexAltitudeChart(input, stabilityText, inPlane),
    },
    ...(windows ? [{
      key: 'windows' as const, heading: 'Stable windows, close up', text: windowZoomText(input), legend: legend(inPlane, true, true),
      spec: windowZoomChart(input, windowZoomText(input), inPlane),
    }] : []),
    { key: 'jacobi', heading: 'Jacobi constant', text: jacobiText, legend: legend(inPlaneAll, false, windows), spec: jacobiAltitudeChart(input, jacobiText, inPlaneAll) },
    { key: 'period', heading: 'Period', text: periodText, legend: legend(inPlaneAll, false, windows), spec: periodJacobiChart(input, periodText, inPlaneAll) },
    {
      key: 'vertical', heading: 'Vertical stability index ν_z', text: verticalText, legend: legend(vertical, true, false),
      spec: indexAltitudeChart(input, verticalText, vertical),
    },
  ];
}

/** The hold-radius chart of a family with screened members. */
export function holdRadiusChartSpec(input: HoldRadiusChartInput): FamilyChartSpec {
  const text = holdRadiusChartText(input);
  const legend = 'Blue dots: in-plane stable members with a hold radius, one panel per stable window; grey line: member order.';
  return { key: 'hold', heading: 'Hold radius across the stable windows', text, legend, spec: holdRadiusChart(input, text) };
}
