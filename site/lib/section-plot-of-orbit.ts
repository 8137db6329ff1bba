// The section plot of a screened orbit: its input, text alternative, build-time SVG geometry and spec.
import { sectionPlotSpec } from '../charts/section-plot-spec.ts';
import { sectionPlotText } from '../charts/section-plot-text.ts';
import type { SectionPlotInput } from '../charts/section-plot-input.ts';
import type { HoldRadiusView } from './orbit-screening-view.ts';
import { sectionPlotFigure, type SectionPlotFigure } from './section-plot-svg.ts';

export interface SectionPlotParts {
  input: SectionPlotInput;
  text: string;
  figure: SectionPlotFigure;
  spec: Record<string, unknown>;
}

export function sectionPlotOf(view: HoldRadiusView, memberLabel: string): SectionPlotParts {
  const input: SectionPlotInput = {
    points: view.points,
    fixedPoint: view.fixedPoint,
    holdRadiusKm: view.holdRadiusKm,
    returns: view.returns,
    memberLabel,
  };
  const text = sectionPlotText(input);
  return { input, text, figure: sectionPlotFigure(input), spec: sectionPlotSpec(input, text) };
}
