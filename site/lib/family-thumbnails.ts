// The row of orbit shapes on a family page: up to `count` members spread evenly along the family.
import type { OrbitRow, SystemRow } from '../../catalog-db/types.ts';
import { memberLabel } from '../../catalog-db/member-label.ts';
import { orbitHref } from './page-links.ts';
import { spreadIndices } from './spread-indices.ts';
import { THUMBNAIL_SAMPLES, plotSamples } from './plot-samples.ts';
import { THUMBNAIL_FIGURE, trajectoryFigure, type TrajectoryFigure } from './trajectory-figures.ts';

export interface Thumbnail {
  orbitId: string;
  href: string;
  label: string;
  figure: TrajectoryFigure | null;
}


export function familyThumbnails(members: OrbitRow[], system: SystemRow, count = 12): Thumbnail[] {
  return spreadIndices(members.length, count).map((i) => {
    const orbit = members[i];
    const samples = plotSamples(system.mu, orbit.state0, orbit.period, THUMBNAIL_SAMPLES);
    const figure = samples.ok
      ? trajectoryFigure(samples.samples, {
        mu: system.mu, lengthUnitKm: system.lengthUnitKm, timeUnitS: system.timeUnitS, primaryName: system.primaryName,
        secondaryName: system.secondaryName, primaryRadiusKm: system.primaryRadiusKm, secondaryRadiusKm: system.secondaryRadiusKm,
      }, 'rotating', THUMBNAIL_FIGURE)
      : null;
    return { orbitId: orbit.id, href: orbitHref(orbit.id), label: `${memberLabel(orbit.seq)}, C ${orbit.jacobi.toFixed(4)}`, figure };
  });
}
