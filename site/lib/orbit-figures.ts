// The three trajectory pictures of an orbit page and their text alternatives, from one propagation.
import type { OrbitPageData } from './orbit-page-data.ts';
import { ORBIT_PAGE_SAMPLES, plotSamples } from './plot-samples.ts';
import { ORBIT_PAGE_FIGURE, trajectoryFigure, type FigureBodies, type FigureFrame, type TrajectoryFigure } from './trajectory-figures.ts';

export interface CaptionedFigure {
  figure: TrajectoryFigure;
  title: string;
  caption: string;
}

export function figureBodies(page: Pick<OrbitPageData, 'system'>): FigureBodies {
  const s = page.system;
  return {
    mu: s.mu, lengthUnitKm: s.lengthUnitKm, timeUnitS: s.timeUnitS, primaryName: s.primaryName,
    secondaryName: s.secondaryName, primaryRadiusKm: s.primaryRadiusKm, secondaryRadiusKm: s.secondaryRadiusKm,
  };
}

export function orbitFigures(page: OrbitPageData): { figures: CaptionedFigure[]; error: string | null } {
  const result = plotSamples(page.system.mu, page.orbit.state0, page.orbit.period, ORBIT_PAGE_SAMPLES);
  if (!result.ok) return { figures: [], error: result.error };
  const bodies = figureBodies(page);
  const { primaryName, secondaryName } = page.system;
  const days = page.periodDays.toFixed(2);
  const alt = (km: number) => `${Math.round(km).toLocaleString('en-US')} km`;
  const frames: Array<[FigureFrame, string]> = [
    ['rotating', `Rotating frame (${primaryName} left, ${secondaryName} right)`],
    ['primary', `Inertial axes centred on ${primaryName}`],
    ['secondary', `Inertial axes centred on ${secondaryName}`],
  ];
  const figures = frames.map(([frame, title]) => {
    const figure = trajectoryFigure(result.samples, bodies, frame, ORBIT_PAGE_FIGURE);
    const projection = figure.planarProjection ? ' Projection on the x–y plane.' : '';
    const caption =
      `One period (${days} days) from the orange dot, ${figure.tickCount} one-day ticks, bodies to scale. ` +
      `Closest approach: ${alt(page.orbit.primaryMinAltKm)} above ${primaryName}, ${alt(page.orbit.secondaryMinAltKm)} above ${secondaryName}.${projection}`;
    return { figure, title, caption };
  });
  return { figures, error: null };
}
