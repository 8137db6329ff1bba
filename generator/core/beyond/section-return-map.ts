// Iterates of the Poincaré return map of the planar CR3BP at fixed Jacobi constant on an orbit's start
// section (start-section.ts): from (x, ẋ) on y = 0, ẏ from C with the section's sign, one return = as many
// section crossings as the orbit itself makes in one period. One continuous integration for all returns.
import { axisSpeedSquared } from '../cr3bp/axis-speed-squared.ts';
import { spatialEquations } from '../cr3bp/equations-spatial.ts';
import type { Rhs } from '../dop853/workspace.ts';
import { AxisCrossingWatch } from './axis-crossing-watch.ts';
import { runWithAxisCrossings, type RunTolerance } from './run-with-axis-crossings.ts';
import { isOnSection, type StartSection } from './start-section.ts';

export interface SectionMap {
  mu: number;
  section: StartSection;
  jacobi: number;
  sectionCrossingsPerReturn: number;
  periodNd: number;
  tolerance: RunTolerance;
  /** A step ending closer than this to a body's centre is an impact. */
  primaryRadiusNd: number;
  secondaryRadiusNd: number;
  /** No return within this time (1.5 periods) ends the iteration. */
  returnWindowNd: number;
  rhs: Rhs;
}

export type MapFailure = 'hill-region' | 'no-return' | 'impact-primary' | 'impact-secondary' | 'integration-error';

export interface MapRun {
  /** Returns delivered to onReturn. */
  returns: number;
  /** Why the map could not go on, or null (all returns made, or onReturn stopped it). */
  failure: MapFailure | null;
}

export function sectionMap(
  mu: number, section: StartSection, jacobi: number, sectionCrossingsPerReturn: number, periodNd: number,
  tolerance: RunTolerance, primaryRadiusNd = 1e-9, secondaryRadiusNd = 1e-9,
): SectionMap {
  return {
    mu, section, jacobi, sectionCrossingsPerReturn, periodNd, tolerance, primaryRadiusNd, secondaryRadiusNd,
    returnWindowNd: 1.5 * periodNd, rhs: spatialEquations(mu),
  };
}

const start = new Float64Array(6);

/** Iterates from (x, ẋ) until `returns` returns, a failure, or onReturn(x, ẋ, index) returning false. */
export function iterateSectionMap(
  map: SectionMap, x: number, vx: number, returns: number, onReturn: (x: number, vx: number, index: number) => boolean,
): MapRun {
  const { mu, section, jacobi } = map;
  const vySquared = axisSpeedSquared(mu, x, jacobi) - vx * vx;
  if (!(vySquared > 0)) return { returns: 0, failure: 'hill-region' };
  start[0] = x; start[1] = 0; start[2] = 0; start[3] = vx; start[4] = section.direction * Math.sqrt(vySquared); start[5] = 0;
  let hits = 0;
  let count = 0;
  let stoppedByCaller = false;
  const perReturn = map.sectionCrossingsPerReturn;
  const watch = new AxisCrossingWatch(mu, map.primaryRadiusNd, map.secondaryRadiusNd, (t, s) => {
    if (!isOnSection(section, s) || ++hits % perReturn !== 0) return false;
    watch.deadlineNd = t + map.returnWindowNd;
    const goOn = onReturn(s[0], s[3], count++);
    if (!goOn) stoppedByCaller = true;
    return !goOn || count >= returns;
  });
  const run = runWithAxisCrossings(map.rhs, start, 0, returns * map.returnWindowNd + map.periodNd, map.tolerance, watch, map.returnWindowNd);
  if (stoppedByCaller || count >= returns) return { returns: count, failure: null };
  return { returns: count, failure: run.stop === 'deadline' || run.stop === 'end' || run.stop === 'handler' ? 'no-return' : run.stop };
}
