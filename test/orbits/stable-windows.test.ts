// Stable windows and bifurcations of a generated E1M1 family, re-analysed independently: every stored
// orbit's state0 is propagated with the STM by odex with our own variational equations (helpers/odex-flow.ts),
// and the indices are taken from that monodromy.
// Outside sources: Hénon 1973 (A&A 28) for ν = (tr M_plane − 2)/2, stability iff |ν| < 1, ν = +1 a tangent
// bifurcation and ν = −1 a period doubling; DESIGN.md for the window being a maximal stretch with |ν| < 1.
import { beforeAll, describe, expect, it } from 'vitest';
import type { FamilyBundle, OrbitRow } from '../../catalog-db/types.ts';
import { E1M1_JOB, EARTH_MOON, jobResult } from './helpers/earth-moon-jobs.ts';
import { independentIndices } from './helpers/independent-analysis.ts';
import { odexMinDistances } from './helpers/odex-flow.ts';

const mu = EARTH_MOON.mu;
const INDEX_TOLERANCE = E1M1_JOB.indexTolerance; // 1e-6, the accuracy the job asks for

describe('stable windows and bifurcations of an E1M1 family', () => {
  let family: FamilyBundle;
  const orbitAt = (arclength: number): OrbitRow => {
    const found = family.orbits.find((o) => o.arclength === arclength);
    if (!found) throw new Error(`no stored orbit at arclength ${arclength}`);
    return found;
  };
  beforeAll(() => {
    family = jobResult(E1M1_JOB).bundles[0];
  });

  it('has a stable window (this family has one of roughly 190 km in perilune altitude near C = 3.045)', () => {
    // From a full-resolution run of this family (scratch/lyap.ts E1M1); only its existence is relied on here.
    expect(family.stableWindows.length).toBeGreaterThanOrEqual(1);
    expect(family.family.stableWindowCount).toBe(family.stableWindows.length);
  });

  it('has |ν| = 1 within the asked tolerance at both edges of every window, re-analysed independently', () => {
    for (const window of family.stableWindows) {
      for (const arclength of [window.fromArclength, window.toArclength]) {
        const edge = orbitAt(arclength);
        // Interior edges (a window cut by a family end would not end at |ν| = 1).
        expect(edge.seq).toBeGreaterThan(0);
        expect(edge.seq).toBeLessThan(family.orbits.length - 1);
        const { inPlane } = independentIndices(mu, edge);
        expect(Math.abs(Math.abs(inPlane) - 1), `${edge.id}: ν = ${inPlane}`).toBeLessThanOrEqual(INDEX_TOLERANCE);
      }
    }
  });

  it('has |ν| < 1 for every member inside a window and |ν| > 1 for its neighbours just outside', () => {
    for (const window of family.stableWindows) {
      const inside = family.orbits.filter((o) => o.arclength > window.fromArclength && o.arclength < window.toArclength);
      expect(inside.length).toBeGreaterThanOrEqual(3);
      for (const orbit of inside) {
        const { inPlane } = independentIndices(mu, orbit);
        expect(Math.abs(inPlane), `${orbit.id}: ν = ${inPlane}`).toBeLessThan(1);
        expect(orbit.stable).toBe(true);
      }
      // Maximal: the stored neighbours beyond the edges are unstable.
      const before = family.orbits[orbitAt(window.fromArclength).seq - 1];
      const after = family.orbits[orbitAt(window.toArclength).seq + 1];
      for (const orbit of [before, after]) expect(Math.abs(independentIndices(mu, orbit).inPlane), orbit.id).toBeGreaterThan(1);
    }
  });

  it('states window rows consistent with their edge orbits', () => {
    for (const window of family.stableWindows) {
      const from = orbitAt(window.fromArclength), to = orbitAt(window.toArclength);
      expect(window.fromJacobi).toBe(from.jacobi);
      expect(window.toJacobi).toBe(to.jacobi);
      expect(window.widthJacobi).toBeCloseTo(Math.abs(to.jacobi - from.jacobi), 14);
      expect(window.widthKm).toBeCloseTo(Math.abs(to.secondaryMinAltKm - from.secondaryMinAltKm), 9);
      const middle = family.orbits.find((o) => o.id === window.midOrbitId)!;
      expect(middle.arclength).toBeGreaterThan(window.fromArclength);
      expect(middle.arclength).toBeLessThan(window.toArclength);
    }
  });

  it('has |ν ∓ 1| within the asked tolerance at every bifurcation row, in its plane, re-analysed independently', () => {
    expect(family.bifurcations.length).toBeGreaterThan(0);
    for (const row of family.bifurcations) {
      const orbit = orbitAt(row.arclength);
      expect(row.state0).toEqual(orbit.state0);
      const target = row.kind === 'tangent' ? 1 : -1;
      const indices = independentIndices(mu, orbit);
      const index = row.plane === 'in-plane' ? indices.inPlane : indices.vertical;
      expect(Math.abs(index - target), `${row.id} (${row.kind}, ${row.plane}): ν = ${index}`).toBeLessThanOrEqual(INDEX_TOLERANCE);
    }
  });

  it('locates every crossing of ±1 between neighbouring members (none is dropped)', () => {
    const located = new Set(family.bifurcations.map((b) => b.arclength));
    const ordinary = family.orbits.filter((o) => !located.has(o.arclength));
    for (const plane of ['in-plane', 'vertical'] as const) {
      for (const target of [1, -1]) {
        const index = (o: OrbitRow) => (plane === 'in-plane' ? o.stabilityIndex : o.verticalStabilityIndex);
        let crossings = 0;
        for (let i = 0; i + 1 < ordinary.length; i++) {
          if ((index(ordinary[i]) - target) * (index(ordinary[i + 1]) - target) < 0) crossings++;
        }
        const rows = family.bifurcations.filter((b) => b.plane === plane && b.kind === (target === 1 ? 'tangent' : 'period-doubling'));
        expect(rows.length, `${plane} ν = ${target}`).toBe(crossings);
      }
    }
  });

  it('never places a window orbit inside a body (independent closest approaches)', () => {
    for (const window of family.stableWindows) {
      const middle = family.orbits.find((o) => o.id === window.midOrbitId)!;
      for (const orbit of [orbitAt(window.fromArclength), middle, orbitAt(window.toArclength)]) {
        const [earthNd, moonNd] = odexMinDistances(mu, orbit.state0, orbit.period, [-mu, 1 - mu]);
        const earthKm = earthNd * EARTH_MOON.lengthUnitKm, moonKm = moonNd * EARTH_MOON.lengthUnitKm;
        expect(moonKm, orbit.id).toBeGreaterThan(EARTH_MOON.secondaryRadiusKm);
        expect(earthKm, orbit.id).toBeGreaterThan(EARTH_MOON.primaryRadiusKm);
      }
    }
  });
});
