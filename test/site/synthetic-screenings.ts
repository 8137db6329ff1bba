// SYNTHETIC DATA, NOT PHYSICS. Adds invented hold radii and Sun/eccentricity screenings to the stable
// members of a catalog's families, and two invented vertical bifurcations per family (one at a stored
// member, as the generator stores them, one between two members) (rewriting each family through catalog-db's writer, as the generator
// does), for the site's checks that pages, charts and the finder show what the database holds, and for the
// build benchmark's page weight. Nothing is integrated: the curve is an ellipse around the fixed point, the
// fractions and departures are smooth made-up functions of the member's position.
import { openCatalogForRead, openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import type { BifurcationRow, FamilyBundle, HoldRadiusRow, ModelScreeningRow, OrbitRow, SystemRow } from '../../catalog-db/types.ts';

export interface SyntheticScreeningOptions {
  /** Families to leave alone (e.g. a real orbit written beside the synthetic ones). */
  skipFamilies?: string[];
  /** Stored curve points per screened member (the generator keeps at most 400). */
  curvePoints?: number;
  phases?: number;
  /** Every n-th stable member stays unscreened (a stable member the run did not screen); 0: none. */
  leaveEvery?: number;
  /** Every n-th screened member also gets a hold radius (the generator computes it for a few per window). */
  holdEvery?: number;
  /** Add the two invented vertical bifurcations per family (default true). */
  verticalBranchPoints?: boolean;
}

export interface SyntheticScreeningSummary {
  holdRadii: number;
  modelScreenings: number;
}

/** Invented rows for one stable member; k is its index among the family's stable members. */
export function syntheticScreeningRows(orbit: OrbitRow, system: SystemRow, k: number, curvePoints: number, phases: number) {
  const holdRadiusKm = Number((40 + 600 * Math.abs(Math.sin(0.37 * k + orbit.seq))).toFixed(3));
  const lu = system.lengthUnitKm;
  const vu = lu / system.timeUnitS;
  const rNd = holdRadiusKm / lu;
  const aVx = (0.002 + 0.001 * Math.cos(k)) / vu * (holdRadiusKm / 300); // ẋ half-width: a few m/s per 300 km
  const rotation = 0.3 + 0.2 * Math.sin(k);
  const curveX: number[] = [];
  const curveVx: number[] = [];
  for (let i = 0; i < curvePoints; i++) {
    const theta = i * rotation;
    curveX.push(orbit.state0[0] + rNd * Math.cos(theta));
    curveVx.push(orbit.state0[3] + aVx * Math.sin(theta));
  }
  const hold: HoldRadiusRow = {
    orbitId: orbit.id,
    familyId: orbit.familyId,
    holdRadiusKm,
    holdRadiusNd: rNd,
    failingDisplacementKm: k % 4 === 3 ? null : holdRadiusKm * 1.0625,
    returns: 200,
    curveX,
    curveVx,
    rotationPerReturnRad: k % 5 === 4 ? null : rotation,
  };
  const phaseRad = Array.from({ length: phases }, (_, i) => (2 * Math.PI * i) / phases);
  const screening = (model: 'bicircular' | 'elliptic', salt: number): ModelScreeningRow => {
    const firstBrokenPeriods = phaseRad.map((_, i) => {
      const v = Math.sin(1.3 * k + salt + 0.9 * i);
      return v > 0.2 ? null : 1 + Math.floor(6 * (v + 1));
    });
    const held = firstBrokenPeriods.filter((p) => p === null).length;
    return {
      orbitId: orbit.id,
      familyId: orbit.familyId,
      model,
      spanNd: model === 'bicircular' ? 60 : 12 * Math.PI,
      phases,
      survivingFraction: held / phases,
      firstBrokenPeriods,
      phaseRad,
      // 0 where no period held, as the generator stores it
      maxDepartureKm: phaseRad.map((_, i) => (firstBrokenPeriods[i] === 1 ? 0 : Number((holdRadiusKm * (0.2 + 0.5 * Math.abs(Math.cos(k + i + salt)))).toFixed(3)))),
      parameters: model === 'bicircular'
        ? { sunMass: 328900.54, sunDistance: 388.81114, sunRate: -0.925195985 }
        : { eccentricity: 0.0549 },
    };
  };
  // every third member has only the Sun screening (a run that skipped the elliptic model for it)
  const screenings = k % 3 === 2 ? [screening('bicircular', 0)] : [screening('bicircular', 0), screening('elliptic', 2)];
  return { hold, screenings };
}

/** ν_z = +1 exactly at the member a third of the way along; ν_z = −1 halfway between two later members. */
export function syntheticVerticalBifurcations(familyId: string, orbits: OrbitRow[]): BifurcationRow[] {
  if (orbits.length < 4) return [];
  const at = orbits[Math.floor(orbits.length / 3)];
  const a = orbits[Math.floor((2 * orbits.length) / 3)];
  const b = orbits[Math.floor((2 * orbits.length) / 3) + 1];
  const mid = (x: number, y: number) => (x + y) / 2;
  return [
    {
      id: `${familyId}/synthetic-vertical-0`, familyId, kind: 'tangent', plane: 'vertical', arclength: at.arclength,
      jacobi: at.jacobi, secondaryMinAltKm: at.secondaryMinAltKm, periodDays: at.periodDays, state0: at.state0,
    },
    {
      id: `${familyId}/synthetic-vertical-1`, familyId, kind: 'period-doubling', plane: 'vertical',
      arclength: mid(a.arclength, b.arclength), jacobi: mid(a.jacobi, b.jacobi),
      secondaryMinAltKm: mid(a.secondaryMinAltKm, b.secondaryMinAltKm), periodDays: mid(a.periodDays, b.periodDays),
      state0: a.state0.map((v, i) => mid(v, b.state0[i])) as BifurcationRow['state0'],
    },
  ];
}

export function addSyntheticScreenings(path: string, options: SyntheticScreeningOptions = {}): SyntheticScreeningSummary {
  const { skipFamilies = [], curvePoints = 120, phases = 8, leaveEvery = 5, holdEvery = 2, verticalBranchPoints = true } = options;
  const reader = openCatalogForRead(path);
  const bundles: FamilyBundle[] = [];
  try {
    const systems = new Map(reader.systems().map((s) => [s.id, s]));
    for (const family of reader.families()) {
      if (skipFamilies.includes(family.id)) continue;
      const system = systems.get(family.systemId)!;
      const orbits = reader.orbits(family.id);
      const holdRadii: HoldRadiusRow[] = [];
      const modelScreenings: ModelScreeningRow[] = [];
      let k = 0;
      for (const orbit of orbits) {
        if (!orbit.stable) continue;
        k++;
        if (leaveEvery > 0 && k % leaveEvery === 0) continue;
        const rows = syntheticScreeningRows(orbit, system, k, curvePoints, phases);
        if (k % holdEvery === 1 % holdEvery) holdRadii.push(rows.hold);
        modelScreenings.push(...rows.screenings);
      }
      const bifurcations = reader.bifurcations(family.id);
      if (verticalBranchPoints) bifurcations.push(...syntheticVerticalBifurcations(family.id, orbits));
      bundles.push({ family, orbits, stableWindows: reader.stableWindows(family.id), bifurcations, holdRadii, modelScreenings });
    }
  } finally {
    reader.close();
  }
  const writer = openCatalogForWrite(path);
  const summary: SyntheticScreeningSummary = { holdRadii: 0, modelScreenings: 0 };
  try {
    for (const bundle of bundles) {
      writer.writeFamily(bundle);
      summary.holdRadii += bundle.holdRadii?.length ?? 0;
      summary.modelScreenings += bundle.modelScreenings?.length ?? 0;
    }
  } finally {
    writer.close();
  }
  return summary;
}
