// Invented hold-radius and model-screening rows for storage tests, hung on the orbits of a bundle made by
// test/catalog-db/make-rows.ts. The numbers mean nothing physically; they are awkward for storage
// instead (non-terminating binary fractions, an empty curve, nulls in the per-phase list, the largest
// double); the survivingFraction agrees with firstBrokenPeriods, as validation demands.
import type { FamilyBundle, HoldRadiusRow, ModelScreeningRow } from '../../catalog-db/types.ts';

export function makeHoldRadius(bundle: FamilyBundle, orbitIndex: number, offset = 0): HoldRadiusRow {
  const orbit = bundle.orbits[orbitIndex]!;
  const n = orbitIndex === 0 ? 0 : 7; // the first one held nothing: empty curve, nulls
  return {
    orbitId: orbit.id,
    familyId: orbit.familyId,
    holdRadiusKm: n === 0 ? 0 : 123.4 + offset + 0.1,
    holdRadiusNd: n === 0 ? 0 : (123.4 + offset + 0.1) / 384400,
    failingDisplacementKm: n === 0 ? 0.3844 : 125.1 + offset,
    returns: 200,
    curveX: Array.from({ length: n }, (_, k) => -0.8 + Math.cos(k) / 3e4),
    curveVx: Array.from({ length: n }, (_, k) => Math.sin(k) / 7e3),
    rotationPerReturnRad: n === 0 ? null : 1.2744262011271714 + offset,
  };
}

export function makeScreening(bundle: FamilyBundle, orbitIndex: number, model: 'bicircular' | 'elliptic', offset = 0): ModelScreeningRow {
  const orbit = bundle.orbits[orbitIndex]!;
  const phases = model === 'bicircular' ? 8 : 3;
  const firstBrokenPeriods = Array.from({ length: phases }, (_, k) => (k % 3 === 1 ? null : k + 1));
  return {
    orbitId: orbit.id,
    familyId: orbit.familyId,
    model,
    spanNd: 81.7 + offset,
    phases,
    survivingFraction: firstBrokenPeriods.filter((p) => p === null).length / phases,
    firstBrokenPeriods,
    phaseRad: Array.from({ length: phases }, (_, k) => (2 * Math.PI * k) / phases),
    maxDepartureKm: Array.from({ length: phases }, (_, k) => (k === 2 ? 1.7976931348623157e308 : k / 3 + offset)),
    parameters: model === 'bicircular'
      ? { sunMass: 328900.54, sunDistance: 388.81114, sunRate: -0.9251988 }
      : { eccentricity: 0.0549 },
  };
}

/** The bundle with hold radii on orbits 0 and 2 and both screenings on orbits 2 and 1 (in that order). */
export function withScreenings(bundle: FamilyBundle, offset = 0): FamilyBundle {
  return {
    ...bundle,
    holdRadii: [makeHoldRadius(bundle, 2, offset), makeHoldRadius(bundle, 0, offset)],
    modelScreenings: [
      makeScreening(bundle, 2, 'elliptic', offset),
      makeScreening(bundle, 2, 'bicircular', offset),
      makeScreening(bundle, 1, 'bicircular', offset),
    ],
  };
}
