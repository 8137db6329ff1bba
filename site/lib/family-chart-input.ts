// Catalog rows of one family → the plain numbers its charts are drawn from.
import type { FamilyChartInput } from '../charts/chart-input.ts';
import type { CatalogSnapshot } from './catalog-source.ts';
import { requireFamily } from './catalog-source.ts';
import { orbitHref } from './page-links.ts';

export function familyChartInput(catalog: CatalogSnapshot, familyId: string): FamilyChartInput {
  const { system } = requireFamily(catalog, familyId);
  return {
    secondaryName: system.secondaryName,
    members: (catalog.orbitsByFamily.get(familyId) ?? []).map((o) => ({
      id: o.id,
      seq: o.seq,
      href: catalog.pagedOrbitIds.has(o.id) ? orbitHref(o.id) : null,
      altKm: o.secondaryMinAltKm,
      nu: o.stabilityIndex,
      nuV: o.verticalStabilityIndex,
      jacobi: o.jacobi,
      periodDays: o.periodDays,
    })),
    windows: (catalog.windowsByFamily.get(familyId) ?? []).map((w) => ({
      fromAltKm: w.fromSecondaryMinAltKm,
      toAltKm: w.toSecondaryMinAltKm,
      fromJacobi: w.fromJacobi,
      toJacobi: w.toJacobi,
    })),
    bifurcations: (catalog.bifurcationsByFamily.get(familyId) ?? []).map((b) => ({
      kind: b.kind,
      plane: b.plane,
      altKm: b.secondaryMinAltKm,
      jacobi: b.jacobi,
      periodDays: b.periodDays,
    })),
  };
}
