// Catalog rows of one family → the hold-radius chart's numbers (members placed in windows by arclength).
import type { HoldRadiusChartInput, HoldRadiusPoint } from '../charts/hold-radius-input.ts';
import type { CatalogSnapshot } from './catalog-source.ts';
import { familyChartInput } from './family-chart-input.ts';
import { orbitHref } from './page-links.ts';

export function holdRadiusChartInput(catalog: CatalogSnapshot, familyId: string): HoldRadiusChartInput | null {
  const rows = catalog.holdRadiiByFamily.get(familyId) ?? [];
  if (rows.length === 0) return null;
  const windows = catalog.windowsByFamily.get(familyId) ?? [];
  const windowOf = (arclength: number): number | null => {
    const i = windows.findIndex((w) => arclength >= Math.min(w.fromArclength, w.toArclength) && arclength <= Math.max(w.fromArclength, w.toArclength));
    return i < 0 ? null : i;
  };
  const points: HoldRadiusPoint[] = [];
  for (const row of rows) {
    const orbit = catalog.orbitById.get(row.orbitId);
    if (!orbit) continue;
    const screenings = catalog.screeningsByOrbit.get(orbit.id);
    points.push({
      id: orbit.id,
      seq: orbit.seq,
      href: orbitHref(orbit.id),
      altKm: orbit.secondaryMinAltKm,
      jacobi: orbit.jacobi,
      holdKm: row.holdRadiusKm,
      window: windowOf(orbit.arclength),
      sunFraction: screenings?.bicircular?.survivingFraction ?? null,
      eccFraction: screenings?.elliptic?.survivingFraction ?? null,
    });
  }
  points.sort((a, b) => a.seq - b.seq);
  return points.length === 0 ? null : { family: familyChartInput(catalog, familyId), points };
}
