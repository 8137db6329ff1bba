// A fold of a family in C can hide both branches' roots inside one grid cell. At Earth–Moon C = 3.17666,
// beyond the Earth, ẏ0 < 0, three neighbouring points of the default discovery grid (600 per segment) keep
// the sign of ẋ_6 while |ẋ_6| dips toward zero; the parabola through them dips through zero (fold-dip-at.ts),
// so the cells are sampled finer and a pair of E3M2 roots appears: two distinct symmetric orbits close
// together, the two branches of a fold (common practice: bracketing a double root by a quadratic model).
// The corrected orbits are checked with odex (npm reference integrator): a perpendicular crossing of the
// x-axis at T/2 (mirror theorem, Roy & Ovenden 1955).
import { describe, expect, it } from 'vitest';
import { analyseOrbit } from '../../generator/core/orbits/analyse-orbit.ts';
import { correctAtFixedX0 } from '../../generator/core/orbits/correct-on-arc.ts';
import { residualOptionsOf } from '../../generator/core/orbits/discovery/discover-candidates.ts';
import { foldDipAt } from '../../generator/core/orbits/discovery/fold-dip-at.ts';
import { jumpEdgeCandidates } from '../../generator/core/orbits/discovery/jump-edge-candidates.ts';
import { refineCandidate } from '../../generator/core/orbits/discovery/refine-candidate.ts';
import { computeResidualGrid, RECORD, residualIndex } from '../../generator/core/orbits/discovery/residual-grid.ts';
import { zeroSetCandidates } from '../../generator/core/orbits/discovery/zero-set-candidates.ts';
import { segmentGrid } from '../../generator/core/orbits/scan-axis-segment.ts';
import { EARTH_MOON } from './helpers/earth-moon-jobs.ts';
import { EARTH_MOON_XL1, earthMoonDiscoveryRequest, TIGHT_CORRECTOR } from './helpers/earth-moon-discovery.ts';
import { odexFlow } from './helpers/odex-flow.ts';

const JACOBI = 3.17666;
const HALF_CROSSINGS = 6;
const CORRECTOR = TIGHT_CORRECTOR;

const REQUEST = earthMoonDiscoveryRequest({ segment: 'far-primary', direction: -1, gridPoints: 600, levels: [JACOBI], maxHalfCrossings: HALF_CROSSINGS });

describe('a fold whose two roots share a grid cell', () => {
  const all = segmentGrid(REQUEST.mu, REQUEST.segment, REQUEST.gridPoints, REQUEST);
  const centre = all.findIndex((x) => Math.abs(x + 0.316037) < 5e-7);
  const xs = all.slice(centre - 1, centre + 2);
  const options = { ...residualOptionsOf(REQUEST), xL1: REQUEST.xL1 };
  const grid = computeResidualGrid(REQUEST.mu, REQUEST.segment, REQUEST.direction, xs, REQUEST.levels, HALF_CROSSINGS, options)!;

  it('shows no sign change on the grid, but a dip of the parabola through zero', () => {
    expect(centre).toBeGreaterThan(0);
    const vx = [0, 1, 2].map((i) => grid.records[residualIndex(grid, i, 0, HALF_CROSSINGS) + RECORD.vx]!);
    expect(vx[0]! * vx[1]!).toBeGreaterThan(0);
    expect(vx[1]! * vx[2]!).toBeGreaterThan(0);
    expect(zeroSetCandidates(grid).filter((c) => c.halfCrossings === HALF_CROSSINGS)).toEqual([]);
    expect(foldDipAt(grid, 1, 0, HALF_CROSSINGS)).toBe(true);
  });

  it('is sampled finer and gives two distinct E3M2 orbits that pass the neck, perpendicular at T/2 (odex)', () => {
    const inside = jumpEdgeCandidates(grid, options, 0)!.filter((c) => c.halfCrossings === HALF_CROSSINGS);
    const orbits = inside
      .map((c) => refineCandidate(EARTH_MOON.mu, c, residualOptionsOf(REQUEST)))
      .map((root) => root && correctAtFixedX0(EARTH_MOON.mu, HALF_CROSSINGS, root.x0, root.vy0, CORRECTOR))
      .filter((o) => o !== null && o !== undefined)
      .filter((o) => {
        const a = analyseOrbit({ mu: EARTH_MOON.mu, xL1: EARTH_MOON_XL1, rtol: 1e-12, atol: 1e-12 }, o.x0, o.vy0, 2 * o.shot.tHalfNd);
        return a.laps.primaryLaps === 3 && a.laps.secondaryLaps === 2 && a.l1Passages >= 2;
      });
    const distinct = [...new Set(orbits.map((o) => o.x0.toFixed(6)))];
    expect(distinct.length).toBeGreaterThanOrEqual(2);
    for (const o of orbits) {
      expect(o.x0).toBeGreaterThan(xs[0]!);
      expect(o.x0).toBeLessThan(xs[2]!);
      const half = odexFlow(EARTH_MOON.mu, [o.x0, 0, 0, 0, o.vy0, 0], o.shot.tHalfNd).state;
      expect(Math.abs(half[1]!)).toBeLessThan(1e-6);
      expect(Math.abs(half[3]!)).toBeLessThan(1e-6);
    }
  });
});
