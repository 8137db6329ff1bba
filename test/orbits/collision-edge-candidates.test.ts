// A family that ends at a collision has its last roots beside starts that run into a body: at Earth–Moon
// C = 3.061493, far side of the Moon, ẏ0 > 0, the grid edge [1.053425, 1.054328] (one cell of the default
// discovery grid) has a left end that reaches its 7th crossing of y = 0 and a right end that hits the Moon
// first, so the edge shows no sign change of ẋ_7 and no time jump. An E1M1 orbit sits inside it. Edges whose
// two started ends disagree on reaching the k-th crossing are sampled again finer (jump-edge-candidates.ts).
// The corrected orbit is checked with odex (npm reference integrator): a perpendicular crossing of the x-axis
// at T/2 (mirror theorem, Roy & Ovenden 1955).
import { describe, expect, it } from 'vitest';
import { analyseOrbit } from '../../generator/core/orbits/analyse-orbit.ts';
import { correctAtFixedX0 } from '../../generator/core/orbits/correct-on-arc.ts';
import { residualOptionsOf } from '../../generator/core/orbits/discovery/discover-candidates.ts';
import { jumpEdgeCandidates } from '../../generator/core/orbits/discovery/jump-edge-candidates.ts';
import { refineCandidate } from '../../generator/core/orbits/discovery/refine-candidate.ts';
import { computeResidualGrid, RECORD, residualIndex } from '../../generator/core/orbits/discovery/residual-grid.ts';
import { zeroSetCandidates } from '../../generator/core/orbits/discovery/zero-set-candidates.ts';
import { EARTH_MOON } from './helpers/earth-moon-jobs.ts';
import { EARTH_MOON_XL1, earthMoonDiscoveryRequest, TIGHT_CORRECTOR } from './helpers/earth-moon-discovery.ts';
import { odexFlow } from './helpers/odex-flow.ts';

const JACOBI = 3.061493;
const HALF_CROSSINGS = 7;
const CORRECTOR = TIGHT_CORRECTOR;

const REQUEST = earthMoonDiscoveryRequest({ segment: 'far-secondary', direction: 1, gridPoints: 2, levels: [JACOBI], maxHalfCrossings: HALF_CROSSINGS });

describe('root edges beside a colliding start', () => {
  const xs = [1.053425, 1.054328];
  const options = { ...residualOptionsOf(REQUEST), xL1: REQUEST.xL1 };
  const grid = computeResidualGrid(REQUEST.mu, REQUEST.segment, REQUEST.direction, xs, REQUEST.levels, HALF_CROSSINGS, options)!;

  it('has one end that reaches the 7th crossing and one that collides first, and no root on the grid', () => {
    const reached = [0, 1].map((i) => Number.isFinite(grid.records[residualIndex(grid, i, 0, HALF_CROSSINGS) + RECORD.t]!));
    expect(reached.filter(Boolean)).toHaveLength(1);
    expect(zeroSetCandidates(grid).filter((c) => c.halfCrossings === HALF_CROSSINGS)).toEqual([]);
  });

  it('is sampled finer and gives an E1M1 orbit that passes the neck, perpendicular at T/2 (odex)', () => {
    const inside = jumpEdgeCandidates(grid, options, 0)!.filter((c) => c.halfCrossings === HALF_CROSSINGS);
    expect(inside.length).toBeGreaterThan(0);
    const orbits = inside
      .map((c) => refineCandidate(EARTH_MOON.mu, c, residualOptionsOf(REQUEST)))
      .map((root) => root && correctAtFixedX0(EARTH_MOON.mu, HALF_CROSSINGS, root.x0, root.vy0, CORRECTOR))
      .filter((o) => o !== null && o !== undefined);
    const e1m1 = orbits.find((o) => {
      const a = analyseOrbit({ mu: EARTH_MOON.mu, xL1: EARTH_MOON_XL1, rtol: 1e-12, atol: 1e-12 }, o.x0, o.vy0, 2 * o.shot.tHalfNd);
      return a.laps.primaryLaps === 1 && a.laps.secondaryLaps === 1 && a.l1Passages >= 2;
    })!;
    expect(e1m1).toBeDefined();
    expect(e1m1.x0).toBeGreaterThan(xs[0]!);
    expect(e1m1.x0).toBeLessThan(xs[1]!);
    const half = odexFlow(EARTH_MOON.mu, [e1m1.x0, 0, 0, 0, e1m1.vy0, 0], e1m1.shot.tHalfNd).state;
    expect(Math.abs(half[1]!)).toBeLessThan(1e-6);
    expect(Math.abs(half[3]!)).toBeLessThan(1e-6);
  });
});
