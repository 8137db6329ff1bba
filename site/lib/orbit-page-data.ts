// Everything an orbit page shows, taken from the catalog rows (no computation beyond unit conversion).
import type { FamilyRow, OrbitRow, OrbitScreenings, SystemRow } from '../../catalog-db/types.ts';
import type { CatalogSnapshot } from './catalog-source.ts';
import { requireFamily } from './catalog-source.ts';
import { screeningView, type ScreeningView } from './orbit-screening-view.ts';
import { familyHref, orbitHref } from './page-links.ts';
import { stateToKm, type StateKm } from './state-units.ts';

export interface NeighbourLink {
  id: string;
  seq: number;
  href: string;
}

export interface OrbitPageData {
  orbit: OrbitRow;
  family: FamilyRow;
  familyHref: string;
  system: SystemRow;
  state0Nd: number[];
  state0Km: StateKm;
  periodNd: number;
  periodDays: number;
  periodS: number;
  /** How many members the family has (the orbit's own number is its seq: catalog-db/member-label.ts). */
  memberCount: number;
  /** The nearest members on either side that have a page (paged-members.ts). */
  previous: NeighbourLink | null;
  next: NeighbourLink | null;
  verticalStable: boolean;
  synodicLock: { p: number; q: number; relError: number | null } | null;
  /** The catalog's hold-radius and screening rows of this orbit (null: not screened). */
  screenings: OrbitScreenings | null;
  /** The same, converted for display. */
  screening: ScreeningView;
}

function neighbour(row: OrbitRow | undefined): NeighbourLink | null {
  return row ? { id: row.id, seq: row.seq, href: orbitHref(row.id) } : null;
}

export function orbitPageData(catalog: CatalogSnapshot, orbitId: string): OrbitPageData {
  const orbit = catalog.orbitById.get(orbitId);
  if (!orbit) throw new Error(`orbit ${JSON.stringify(orbitId)} is not in the catalog`);
  const { family, system } = requireFamily(catalog, orbit.familyId);
  const members = catalog.orbitsByFamily.get(family.id) ?? [];
  const paged = catalog.pagedOrbitsByFamily.get(family.id) ?? [];
  const pagedIndex = paged.indexOf(orbit);
  const screenings = catalog.screeningsByOrbit.get(orbit.id) ?? null;
  return {
    orbit,
    family,
    familyHref: familyHref(family.id),
    system,
    state0Nd: [...orbit.state0],
    state0Km: stateToKm(orbit.state0, system.lengthUnitKm, system.timeUnitS),
    periodNd: orbit.period,
    periodDays: orbit.periodDays,
    periodS: orbit.period * system.timeUnitS,
    memberCount: members.length,
    previous: pagedIndex > 0 ? neighbour(paged[pagedIndex - 1]) : null,
    next: pagedIndex >= 0 ? neighbour(paged[pagedIndex + 1]) : null,
    verticalStable: Math.abs(orbit.verticalStabilityIndex) < 1,
    synodicLock:
      orbit.synodicP !== null && orbit.synodicQ !== null
        ? { p: orbit.synodicP, q: orbit.synodicQ, relError: orbit.synodicRelError }
        : null,
    screenings,
    screening: screeningView(screenings ?? undefined, orbit, system),
  };
}
