// Discovery finds orbits that start close to a brake orbit, whose roots sit in the last grid cell before the
// zero-velocity curve, where the grid has no second point. At Earth–Moon C = 3.1015161751 (a level where an
// earlier audit of the demo reported near-brake E1M2 orbits missing), far side of the Earth, ẏ0 < 0, 300 start
// points: the grid alone has no E1M2 root of crossing count 4 in the cell that borders the curve; the curve
// cell's samples give one, and it corrects to a symmetric periodic orbit that starts inside that cell. The
// orbit is checked with odex (npm reference integrator): a perpendicular crossing of the x-axis at T/2 (mirror
// theorem, Roy & Ovenden 1955). The zero-velocity curve is where the start speed vanishes, 2Ω(x, 0) = C
// (Szebehely 1967, ch. 4).
import { describe, expect, it } from 'vitest';
import { axisSpeedSquared } from '../../generator/core/cr3bp/axis-speed-squared.ts';
import { computeResidualGrid } from '../../generator/core/orbits/discovery/residual-grid.ts';
import { zeroSetCandidates } from '../../generator/core/orbits/discovery/zero-set-candidates.ts';
import { zeroVelocityEdgeCandidates } from '../../generator/core/orbits/discovery/zero-velocity-edge-candidates.ts';
import type { ZeroCandidate } from '../../generator/core/orbits/discovery/zero-candidate.ts';
import { residualOptionsOf } from '../../generator/core/orbits/discovery/discover-candidates.ts';
import { segmentGrid } from '../../generator/core/orbits/scan-axis-segment.ts';
import { refineCandidate } from '../../generator/core/orbits/discovery/refine-candidate.ts';
import { correctAtFixedX0 } from '../../generator/core/orbits/correct-on-arc.ts';
import { EARTH_MOON } from './helpers/earth-moon-jobs.ts';
import { earthMoonDiscoveryRequest, TIGHT_CORRECTOR } from './helpers/earth-moon-discovery.ts';
import { odexFlow } from './helpers/odex-flow.ts';

const JACOBI = 3.1015161751;
const HALF_CROSSINGS = 4;
const CORRECTOR = TIGHT_CORRECTOR;

const REQUEST = earthMoonDiscoveryRequest({ segment: 'far-primary', direction: -1, gridPoints: 300, levels: [JACOBI], maxHalfCrossings: HALF_CROSSINGS });

describe('roots between the last grid point and the zero-velocity curve', () => {
  const xs = segmentGrid(REQUEST.mu, REQUEST.segment, REQUEST.gridPoints, REQUEST);
  const options = { ...residualOptionsOf(REQUEST), xL1: REQUEST.xL1 };
  const grid = computeResidualGrid(REQUEST.mu, REQUEST.segment, REQUEST.direction, xs, REQUEST.levels, HALF_CROSSINGS, options)!;
  const reachable = (x: number) => axisSpeedSquared(EARTH_MOON.mu, x, JACOBI) > 0;
  // The cell whose outer end lies beyond the curve, on the Earth's far side near x = −0.84.
  const cell = xs.findIndex((x, i) => i + 1 < xs.length && reachable(x) !== reachable(xs[i + 1]!) && Math.abs(x + 0.84) < 0.02);
  const [cellLow, cellHigh] = [xs[cell]!, xs[cell + 1]!].sort((p, q) => p - q) as [number, number];
  const inCell = (x: number) => x > cellLow && x < cellHigh;
  const isE1M2 = (c: ZeroCandidate) => c.halfCrossings === HALF_CROSSINGS && c.laps.some((l) => l.primaryLaps === 1 && l.secondaryLaps === 2);

  it('the grid alone has no E1M2 root of that crossing count in the cell that borders the curve', () => {
    expect(cell).toBeGreaterThanOrEqual(0);
    expect(zeroSetCandidates(grid).filter((c) => isE1M2(c) && inCell(c.x0Guess))).toEqual([]);
  });

  it('the curve cell gives one, which corrects to a symmetric periodic orbit starting inside the cell (odex)', () => {
    const atCurve = zeroVelocityEdgeCandidates(grid, options, 0)!.filter((c) => isE1M2(c) && inCell(c.x0Guess));
    expect(atCurve.length).toBeGreaterThanOrEqual(1);
    const root = refineCandidate(EARTH_MOON.mu, atCurve[0]!, residualOptionsOf(REQUEST))!;
    const orbit = correctAtFixedX0(EARTH_MOON.mu, HALF_CROSSINGS, root.x0, root.vy0, CORRECTOR)!;
    expect(orbit).not.toBeNull();
    expect(inCell(orbit.x0)).toBe(true);
    const half = odexFlow(EARTH_MOON.mu, [orbit.x0, 0, 0, 0, orbit.vy0, 0], orbit.shot.tHalfNd).state;
    expect(Math.abs(half[1]!)).toBeLessThan(1e-8);
    expect(Math.abs(half[3]!)).toBeLessThan(1e-8);
  });
});
