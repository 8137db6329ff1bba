// Discovery finds orbits that start close to a brake orbit, whose roots sit in the last grid cell before the
// zero-velocity curve. The orbit checked: Earth–Moon E1M2, C = 3.1015161751, x0 = −0.841537634886296,
// ẏ0 = −0.0455237200150587 (a member an earlier audit of the demo reported missing; T/2 = 10.26422345).
// That it is a symmetric periodic orbit is checked here with odex (npm reference integrator): a perpendicular
// crossing of the x-axis at T/2 (mirror theorem, Roy & Ovenden 1955). The zero-velocity curve is where the
// start speed vanishes, 2Ω(x, 0) = C (Szebehely 1967, ch. 4).
import { describe, expect, it } from 'vitest';
import { lagrangePoints } from '../../generator/core/cr3bp/lagrange-points.ts';
import { axisSpeedSquared } from '../../generator/core/cr3bp/axis-speed-squared.ts';
import { computeResidualGrid } from '../../generator/core/orbits/discovery/residual-grid.ts';
import { zeroSetCandidates } from '../../generator/core/orbits/discovery/zero-set-candidates.ts';
import { zeroVelocityEdgeCandidates } from '../../generator/core/orbits/discovery/zero-velocity-edge-candidates.ts';
import { residualOptionsOf, type DiscoveryRequest } from '../../generator/core/orbits/discovery/discover-candidates.ts';
import { segmentGrid } from '../../generator/core/orbits/scan-axis-segment.ts';
import { EARTH_MOON } from './helpers/earth-moon-jobs.ts';
import { odexFlow } from './helpers/odex-flow.ts';

const JACOBI = 3.1015161751;
const X0 = -0.841537634886296;
const VY0 = -0.0455237200150587;
const HALF_PERIOD_ND = 10.26422345;
const HALF_CROSSINGS = 4;

const REQUEST: DiscoveryRequest = {
  mu: EARTH_MOON.mu, segment: 'far-primary', direction: -1, gridPoints: 300, levels: [JACOBI], maxHalfCrossings: HALF_CROSSINGS,
  rtol: 1e-10, atol: 1e-10, maxHalfTimeNd: 20,
  primaryRadiusNd: EARTH_MOON.primaryRadiusKm / EARTH_MOON.lengthUnitKm, secondaryRadiusNd: EARTH_MOON.secondaryRadiusKm / EARTH_MOON.lengthUnitKm,
  xL1: lagrangePoints(EARTH_MOON.mu)[0]!.x, reachNd: 1.2,
};

describe('roots between the last grid point and the zero-velocity curve', () => {
  const xs = segmentGrid(REQUEST.mu, REQUEST.segment, REQUEST.gridPoints, REQUEST);
  const options = { ...residualOptionsOf(REQUEST), xL1: REQUEST.xL1 };
  const grid = computeResidualGrid(REQUEST.mu, REQUEST.segment, REQUEST.direction, xs, REQUEST.levels, HALF_CROSSINGS, options)!;
  const reachable = (x: number) => axisSpeedSquared(EARTH_MOON.mu, x, JACOBI) > 0;
  const lastCell = xs.findIndex((x, i) => i + 1 < xs.length && reachable(x) !== reachable(xs[i + 1]!) && Math.abs(x - X0) < 0.02);

  it('the orbit is symmetric periodic (odex) and starts inside the cell that borders the curve', () => {
    const half = odexFlow(EARTH_MOON.mu, [X0, 0, 0, 0, VY0, 0], HALF_PERIOD_ND).state;
    expect(Math.abs(half[1]!)).toBeLessThan(1e-7);
    expect(Math.abs(half[3]!)).toBeLessThan(1e-7);
    expect(lastCell).toBeGreaterThanOrEqual(0);
    const [a, b] = [xs[lastCell]!, xs[lastCell + 1]!].sort((p, q) => p - q);
    expect(X0).toBeGreaterThan(a!);
    expect(X0).toBeLessThan(b!);
  });

  it('the grid alone has no root there; the curve cell has it, with the signature E1M2', () => {
    const near = (x: number) => Math.abs(x - X0) < 2e-3;
    const onGrid = zeroSetCandidates(grid).filter((c) => c.halfCrossings === HALF_CROSSINGS && near(c.x0Guess));
    expect(onGrid).toEqual([]);
    const atCurve = zeroVelocityEdgeCandidates(grid, options, 0).filter((c) => c.halfCrossings === HALF_CROSSINGS && near(c.x0Guess));
    expect(atCurve.length).toBe(1);
    expect(atCurve[0]!.laps).toContainEqual({ primaryLaps: 1, secondaryLaps: 2 });
    expect(atCurve[0]!.withinEdge).toBe(true);
  });
});
