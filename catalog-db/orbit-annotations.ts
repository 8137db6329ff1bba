// What the export adds to each orbit of a family beyond its own row: the hold radius and model
// screenings stored for it, and whether it is a vertically critical member (a branch point of a spatial
// family: a bifurcation row with plane 'vertical' sits at its arclength).
import type { BifurcationRow, CatalogReader, HoldRadiusRow, ModelScreeningRow, OrbitRow } from './types.ts';

export interface VerticalBranchPoint {
  bifurcationId: string;
  verticalIndex: 1 | -1;
}

export interface OrbitAnnotations {
  holdRadius: Map<string, HoldRadiusRow>;
  screenings: Map<string, { bicircular?: ModelScreeningRow; elliptic?: ModelScreeningRow }>;
  verticalBranchPoint: Map<string, VerticalBranchPoint>;
}

export function annotateFamilyOrbits(reader: CatalogReader, familyId: string, orbits: readonly OrbitRow[], bifurcations: readonly BifurcationRow[]): OrbitAnnotations {
  const holdRadius = new Map(reader.holdRadii(familyId).map((row) => [row.orbitId, row] as const));
  const screenings: OrbitAnnotations['screenings'] = new Map();
  for (const row of reader.modelScreenings(familyId)) {
    const entry = screenings.get(row.orbitId) ?? {};
    entry[row.model] = row;
    screenings.set(row.orbitId, entry);
  }
  return { holdRadius, screenings, verticalBranchPoint: verticalBranchPoints(orbits, bifurcations) };
}

/** The vertically critical members of a family, by orbit id (also used by the site, without a reader). */
export function verticalBranchPoints(orbits: readonly OrbitRow[], bifurcations: readonly BifurcationRow[]): Map<string, VerticalBranchPoint> {
  // Bifurcation rows copy the arclength of the member stored there (build-family-bundle.ts), so the
  // match is exact.
  const orbitAt = new Map(orbits.map((orbit) => [orbit.arclength, orbit.id] as const));
  const found = new Map<string, VerticalBranchPoint>();
  for (const bifurcation of bifurcations) {
    const orbitId = orbitAt.get(bifurcation.arclength);
    if (orbitId === undefined || bifurcation.plane !== 'vertical') continue;
    found.set(orbitId, { bifurcationId: bifurcation.id, verticalIndex: bifurcation.kind === 'tangent' ? 1 : -1 });
  }
  return found;
}
