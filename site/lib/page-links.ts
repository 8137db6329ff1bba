// Addresses of the site's pages and files, all under the base path.
import { idToPath } from './id-path.ts';
import { withBase } from './site-url.ts';

export const familyHref = (familyId: string): string => withBase(`family/${idToPath(familyId)}/`);
export const orbitHref = (orbitId: string): string => withBase(`orbit/${idToPath(orbitId)}/`);
/** One chart of a family as an SVG file (the stability one is also shown on every member's page). */
export const familyChartImageHref = (familyId: string, chartKey: string): string =>
  withBase(`chart-images/${idToPath(familyId)}/${chartKey}.svg`);
export const familyStabilityImageHref = (familyId: string): string => familyChartImageHref(familyId, 'stability');
/** The family's chart specs, loaded by the page on the first interaction with a chart. */
export const familyChartSpecsHref = (familyId: string): string => withBase(`data/family-charts/${idToPath(familyId)}/specs.json`);
export const finderHref = (query = ''): string => withBase(`finder/${query ? `?${query}` : ''}`);
export const finderDataHref = (): string => withBase('data/finder.json');
export const catalogSqliteHref = (): string => withBase('downloads/catalog.sqlite');
export const catalogJsonHref = (): string => withBase('downloads/catalog.json');
/** The glossary, or one of its entries by anchor. */
export const glossaryHref = (anchor = ''): string => withBase(`glossary/${anchor ? `#${anchor}` : ''}`);
