// What the orbit-field getters read for one orbit of the site's catalog snapshot.
import type { OrbitFieldSource } from '../../catalog-db/orbit-field-types.ts';
import { verticalBranchPoints } from '../../catalog-db/orbit-annotations.ts';
import type { OrbitRow } from '../../catalog-db/types.ts';
import { requireFamily, type CatalogSnapshot } from './catalog-source.ts';

const branchPointsBySnapshot = new WeakMap<CatalogSnapshot, Map<string, number>>();

function verticalCriticalIndices(catalog: CatalogSnapshot): Map<string, number> {
  let found = branchPointsBySnapshot.get(catalog);
  if (!found) {
    found = new Map();
    for (const [familyId, members] of catalog.orbitsByFamily) {
      for (const [orbitId, point] of verticalBranchPoints(members, catalog.bifurcationsByFamily.get(familyId) ?? [])) found.set(orbitId, point.verticalIndex);
    }
    branchPointsBySnapshot.set(catalog, found);
  }
  return found;
}

export function orbitFieldSource(catalog: CatalogSnapshot, orbit: OrbitRow): OrbitFieldSource {
  const { family, system } = requireFamily(catalog, orbit.familyId);
  const screenings = catalog.screeningsByOrbit.get(orbit.id);
  return {
    orbit, family, system,
    holdRadiusKm: screenings?.holdRadius?.holdRadiusKm ?? null,
    sunSurvivingFraction: screenings?.bicircular?.survivingFraction ?? null,
    eccentricitySurvivingFraction: screenings?.elliptic?.survivingFraction ?? null,
    verticalCriticalIndex: verticalCriticalIndices(catalog).get(orbit.id) ?? null,
  };
}
