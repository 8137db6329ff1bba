// The perpendicular-crossing residual on a grid of (x0, C): from every reachable perpendicular start
// (x0, 0, 0, ±ẏ(C)) one propagation to the K-th crossing of y = 0 records, for each crossing k ≤ K, what
// discovery needs: ẋ_k (zero on a symmetric periodic orbit, mirror theorem, Roy & Ovenden 1955), the time
// and place of the crossing, and the laps and neck passages before it (the lap signature of a root).
import { axisSpeedSquared } from '../../cr3bp/axis-speed-squared.ts';
import type { EventSpec } from '../../events/event-spec.ts';
import { propagate } from '../../propagation/propagate.ts';
import type { AxisSegment } from '../family-job.ts';
import { neckHalfWidth } from '../neck-half-width.ts';

/** Numbers kept per grid point and crossing, in this order (RECORD_STRIDE of them). */
export const RECORD = { vx: 0, t: 1, x: 2, vy: 3, primaryLapsBefore: 4, secondaryLapsBefore: 5, neckBefore: 6 } as const;
export const RECORD_STRIDE = 7;

export interface ResidualGrid {
  mu: number;
  segment: AxisSegment;
  direction: 1 | -1;
  /** Start abscissae (increasing) and Jacobi levels (increasing). */
  xs: Float64Array;
  levels: Float64Array;
  maxHalfCrossings: number;
  /** records[((j · xs.length + i) · K + k − 1) · RECORD_STRIDE + field]; NaN where the start is not
   *  reachable at that level or the crossing was not reached (collision, time limit). */
  records: Float64Array;
}

export interface ResidualGridOptions {
  rtol: number;
  atol: number;
  maxHalfTimeNd: number;
  /** Propagations closer than this to a primary's centre stop (a collision, no crossing). */
  collisionRadiusNd: number;
  xL1: number;
}

export interface GridProgress {
  /** Called after each level with the grid points done so far and in all. */
  onLevel?(pointsDone: number, pointsTotal: number): void;
  shouldStop?(): boolean;
}

export function residualIndex(grid: ResidualGrid, i: number, j: number, k: number): number {
  return ((j * grid.xs.length + i) * grid.maxHalfCrossings + k - 1) * RECORD_STRIDE;
}

function eventsAt(mu: number, xL1: number, jacobi: number, maxHalfCrossings: number): EventSpec[] {
  const neckWidth = neckHalfWidth(mu, xL1, jacobi);
  return [
    { label: 'y=0', g: (_t, s) => s[1], direction: 0, terminalCount: maxHalfCrossings },
    { label: 'neck', g: (_t, s) => s[0] - xL1, direction: 0, accept: (_t, s) => Math.abs(s[1]) < neckWidth },
  ];
}

/** Fills one grid point's records from one propagation; leaves NaN where crossings were not reached. */
function recordPoint(
  grid: ResidualGrid, i: number, j: number, events: readonly EventSpec[], o: ResidualGridOptions,
): void {
  const { mu } = grid;
  const x0 = grid.xs[i]!, jacobi = grid.levels[j]!;
  const vSquared = axisSpeedSquared(mu, x0, jacobi);
  if (!(vSquared > 0)) return;
  let hits;
  try {
    hits = propagate(mu, [x0, 0, 0, grid.direction * Math.sqrt(vSquared)], o.maxHalfTimeNd, {
      rtol: o.rtol, atol: o.atol, events, collisionRadiusNd: o.collisionRadiusNd,
    }).events;
  } catch {
    return; // a collision or a failed step: no crossing here, and no bracket will use this point
  }
  let primaryLaps = 0, secondaryLaps = 0, neck = 0, k = 0;
  for (const hit of hits) {
    if (hit.label === 'neck') {
      neck++;
      continue;
    }
    k++;
    const s = hit.state;
    const at = residualIndex(grid, i, j, k);
    const r = grid.records;
    r[at + RECORD.vx] = s[3]!;
    r[at + RECORD.t] = hit.tNd;
    r[at + RECORD.x] = s[0]!;
    r[at + RECORD.vy] = s[4]!;
    r[at + RECORD.primaryLapsBefore] = primaryLaps;
    r[at + RECORD.secondaryLapsBefore] = secondaryLaps;
    r[at + RECORD.neckBefore] = neck;
    if (s[0]! < -mu && s[4]! < 0) primaryLaps++;
    else if (s[0]! > 1 - mu && s[4]! > 0) secondaryLaps++;
  }
}

export function computeResidualGrid(
  mu: number, segment: AxisSegment, direction: 1 | -1, xs: readonly number[], levels: readonly number[],
  maxHalfCrossings: number, o: ResidualGridOptions, progress: GridProgress = {},
): ResidualGrid | null {
  const grid: ResidualGrid = {
    mu, segment, direction, xs: Float64Array.from(xs), levels: Float64Array.from(levels), maxHalfCrossings,
    records: new Float64Array(xs.length * levels.length * maxHalfCrossings * RECORD_STRIDE).fill(NaN),
  };
  for (let j = 0; j < levels.length; j++) {
    if (progress.shouldStop?.()) return null;
    const events = eventsAt(mu, o.xL1, levels[j]!, maxHalfCrossings);
    for (let i = 0; i < xs.length; i++) recordPoint(grid, i, j, events, o);
    progress.onLevel?.((j + 1) * xs.length, levels.length * xs.length);
  }
  return grid;
}
