// Addresses of the site's pages and files, all under the base path.
import { idToPath } from './id-path.ts';
import { withBase } from './site-url.ts';

export const familyHref = (familyId: string): string => withBase(`family/${idToPath(familyId)}/`);
export const orbitHref = (orbitId: string): string => withBase(`orbit/${idToPath(orbitId)}/`);
/** The family's in-plane stability chart, rendered once and shown on every member's page. */
export const familyStabilityImageHref = (familyId: string): string =>
  withBase(`chart-images/${idToPath(familyId)}/stability.svg`);
export const finderHref = (query = ''): string => withBase(`finder/${query ? `?${query}` : ''}`);
export const finderDataHref = (): string => withBase('data/finder.json');
export const catalogSqliteHref = (): string => withBase('downloads/catalog.sqlite');
export const catalogJsonHref = (): string => withBase('downloads/catalog.json');
