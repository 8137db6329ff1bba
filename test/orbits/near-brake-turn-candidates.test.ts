// A root edge whose two ends disagree on the lap counts still seeds the signature between them. At Earth–Moon
// C = 3.0963278564275023 (a level of the default discovery grid), far side of the Moon, ẏ0 > 0, start points
// 1e-4 apart: the orbit's turn at T/2 lies close to the zero-velocity curve beyond the Earth, so the
// trajectories on either side of the root make one loop more or several fewer there (E3M3 and E0M3 ends, the
// E0M3 end not passing the L1 neck), while the orbit itself is E1M3 and passes the neck twice. Picking root
// edges by one end's counts and the fewer neck passages of the two ends dropped this edge. The corrected orbit
// is checked with odex (npm reference integrator): a perpendicular crossing of the x-axis at T/2 (mirror
// theorem, Roy & Ovenden 1955).
import { describe, expect, it } from 'vitest';
import { analyseOrbit } from '../../generator/core/orbits/analyse-orbit.ts';
import { correctAtFixedX0 } from '../../generator/core/orbits/correct-on-arc.ts';
import { residualOptionsOf } from '../../generator/core/orbits/discovery/discover-candidates.ts';
import { candidatesOfSignature } from '../../generator/core/orbits/discovery/order-candidates.ts';
import { refineCandidate } from '../../generator/core/orbits/discovery/refine-candidate.ts';
import { computeResidualGrid } from '../../generator/core/orbits/discovery/residual-grid.ts';
import { zeroSetCandidates } from '../../generator/core/orbits/discovery/zero-set-candidates.ts';
import { EARTH_MOON } from './helpers/earth-moon-jobs.ts';
import { EARTH_MOON_XL1, earthMoonDiscoveryRequest, TIGHT_CORRECTOR } from './helpers/earth-moon-discovery.ts';
import { odexFlow } from './helpers/odex-flow.ts';

const JACOBI = 3.0963278564275023;
const HALF_CROSSINGS = 5;
const E1M3 = { primaryLaps: 1, secondaryLaps: 3 };
const CORRECTOR = TIGHT_CORRECTOR;

const REQUEST = earthMoonDiscoveryRequest({ segment: 'far-secondary', direction: 1, gridPoints: 41, levels: [JACOBI], maxHalfCrossings: HALF_CROSSINGS });

describe('root edges between two lap signatures', () => {
  const xs = Array.from({ length: 41 }, (_, i) => 1.0734 + i * 1e-4);
  const options = { ...residualOptionsOf(REQUEST), xL1: REQUEST.xL1 };
  const grid = computeResidualGrid(REQUEST.mu, REQUEST.segment, REQUEST.direction, xs, REQUEST.levels, HALF_CROSSINGS, options)!;
  const edge = zeroSetCandidates(grid).find((c) => c.halfCrossings === HALF_CROSSINGS && c.x0A <= 1.07712 && c.x0B >= 1.07711)!;

  it('has ends of other signatures, one of them not passing the neck, and is kept as an E1M3 seed', () => {
    expect(edge).toBeDefined();
    expect(edge.laps).toHaveLength(2);
    expect(edge.laps.some((l) => l.primaryLaps === E1M3.primaryLaps && l.secondaryLaps === E1M3.secondaryLaps)).toBe(false);
    expect(Math.min(...edge.laps.map((l) => l.l1Passages))).toBe(0);
    expect(candidatesOfSignature([edge], E1M3, HALF_CROSSINGS)).toEqual([edge]);
  });

  it('corrects to an E1M3 orbit that passes the neck, perpendicular to the x-axis at T/2 (odex)', () => {
    const root = refineCandidate(EARTH_MOON.mu, edge, residualOptionsOf(REQUEST))!;
    const orbit = correctAtFixedX0(EARTH_MOON.mu, HALF_CROSSINGS, root.x0, root.vy0, CORRECTOR)!;
    expect(orbit).not.toBeNull();
    const analysis = analyseOrbit({ mu: EARTH_MOON.mu, xL1: EARTH_MOON_XL1, rtol: 1e-12, atol: 1e-12 }, orbit.x0, orbit.vy0, 2 * orbit.shot.tHalfNd);
    expect(analysis.laps).toEqual(E1M3);
    expect(analysis.l1Passages).toBeGreaterThanOrEqual(2);
    expect(orbit.shot.state[0]).toBeLessThan(-EARTH_MOON.mu); // the turn lies beyond the Earth
    const half = odexFlow(EARTH_MOON.mu, [orbit.x0, 0, 0, 0, orbit.vy0, 0], orbit.shot.tHalfNd).state;
    // ν ≈ 3e10 here: the half-period flow multiplies a start error of ~1e-15 by √(2ν) ≈ 2.4e5.
    expect(Math.abs(half[1]!)).toBeLessThan(1e-6);
    expect(Math.abs(half[3]!)).toBeLessThan(1e-6);
  });
});
