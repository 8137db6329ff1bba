// What one period of the CR3BP orbit itself looks like on the axis: how often it crosses its own start
// section (the return map is that many section crossings) and its lap counts (orbits/lap-signature.ts).
import { spatialEquations } from '../cr3bp/equations-spatial.ts';
import { assertMassRatio } from '../cr3bp/lagrange-points.ts';
import { countLaps, type AxisCrossing, type LapCounts } from '../cr3bp/lap-signature.ts';
import { AxisCrossingWatch } from './axis-crossing-watch.ts';
import { runWithAxisCrossings, type RunTolerance } from './run-with-axis-crossings.ts';
import { isOnSection, startSection, type StartSection } from './start-section.ts';

export interface ReferencePeriod {
  section: StartSection;
  /** Section crossings in one period (the return to the start included): the return map is this many. */
  sectionCrossingsPerPeriod: number;
  laps: LapCounts;
}

/** Collision radius of the reference run: only the bodies' centres (as propagation/propagate.ts). */
const CENTRE_RADIUS_ND = 1e-9;

export function referencePeriod(mu: number, state0: ArrayLike<number>, periodNd: number, tolerance: RunTolerance): ReferencePeriod {
  assertMassRatio(mu);
  if (!(periodNd > 0) || !Number.isFinite(periodNd)) throw new RangeError(`periodNd must be a positive finite number, got ${periodNd}`);
  const section = startSection(mu, state0);
  // Crossings up to a little past T, so that the return itself (at T ± round-off) is seen; the start is
  // not a crossing of the run (it starts on y = 0) and is added once, as countLaps asks.
  const edgeNd = 1e-3 * periodNd;
  const crossings: AxisCrossing[] = [{ x: section.x0, vy: section.vy0 }];
  let onSection = 0;
  const watch = new AxisCrossingWatch(mu, CENTRE_RADIUS_ND, CENTRE_RADIUS_ND, (t, s) => {
    if (isOnSection(section, s)) onSection++;
    if (t < periodNd - edgeNd) crossings.push({ x: s[0], vy: s[4] });
    return false;
  });
  const run = runWithAxisCrossings(spatialEquations(mu), state0, 0, periodNd + edgeNd, tolerance, watch);
  if (run.stop !== 'end') throw new RangeError(`state0 and periodNd: the CR3BP orbit does not complete one period (${run.stop} at t = ${run.tFinalNd})`);
  if (onSection === 0) throw new RangeError('state0 and periodNd: the CR3BP orbit does not return to its start section within one period');
  return { section, sectionCrossingsPerPeriod: onSection, laps: countLaps(mu, crossings) };
}
