// Which edges of the discovery grids a continued family passes through. A symmetric orbit is a root of
// two grids at once: from x0 with the start direction, and from its other perpendicular crossing x_{T/2}
// with the direction of ẏ there (same crossing count: the second half mirrors the first). A covered root
// edge lies, to the grid's resolution, on a family already continued: discovery skips it.
import type { AxisSegment } from '../family-job.ts';
import { axisSegmentOf } from '../../cr3bp/axis-segment.ts';

/** One member of a family as the coverage reads it: both perpendicular crossings, ẏ there, and C. */
export interface FamilyTracePoint {
  x0: number;
  vy0: number;
  xHalf: number;
  vyHalf: number;
  jacobi: number;
  /** T/2 is this crossing of y = 0: the grids of this crossing count hold the member. */
  halfCrossings: number;
}

interface GridAxes {
  xs: readonly number[];
  levels: readonly number[];
}

/** Index of the cell [v[i], v[i+1]) holding value, or −1 outside the axis. */
function cellIndex(axis: readonly number[], value: number): number {
  if (!(value >= axis[0]! && value <= axis[axis.length - 1]!)) return -1;
  let lo = 0, hi = axis.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (axis[mid]! <= value) lo = mid;
    else hi = mid;
  }
  return Math.min(lo, Math.max(0, axis.length - 2));
}

export class FamilyCoverage {
  private readonly covered = new Set<string>();
  constructor(private readonly mu: number, private readonly grids: ReadonlyMap<string, GridAxes>) {}

  static gridId(segment: AxisSegment, direction: 1 | -1): string {
    return `${segment}${direction}`;
  }

  /** Marks the grid edges along the family's two curves in the (x0, C) grids. */
  addFamily(members: readonly FamilyTracePoint[]): void {
    const curves = [
      members.map((m) => ({ x: m.x0, vy: m.vy0, jacobi: m.jacobi, k: m.halfCrossings })),
      members.map((m) => ({ x: m.xHalf, vy: m.vyHalf, jacobi: m.jacobi, k: m.halfCrossings })),
    ];
    for (const curve of curves) {
      for (let n = 0; n + 1 < curve.length; n++) {
        const a = curve[n]!, b = curve[n + 1]!;
        if (a.k === b.k) this.markSegment(a, b, a.k); // across a change of the count, neither grid holds the segment
      }
    }
  }

  covers(c: { segment: AxisSegment; direction: 1 | -1; halfCrossings: number; along: 'x' | 'jacobi'; i: number; j: number; withinEdge?: boolean }): boolean {
    if (c.withinEdge) return false; // one of several roots inside a grid edge: tried, and dedup decides
    return this.covered.has(edgeKey(FamilyCoverage.gridId(c.segment, c.direction), c.halfCrossings, c.along, c.i, c.j));
  }

  /**
   * Marks the grid edges the segment a–b crosses (the family between two members taken as straight).
   * Only those: families crowd closer than the grid's spacing in places, so marking neighbouring edges
   * too would hide other families' roots; an edge missed by the straight segment costs one correction
   * that then finds the known family.
   */
  private markSegment(a: CurvePoint, b: CurvePoint, k: number): void {
    const id = gridOf(this.mu, a);
    if (id !== gridOf(this.mu, b)) return; // the curve leaves this grid between the two members
    const axes = this.grids.get(id);
    if (!axes) return;
    const { xs, levels } = axes;
    // Edges along x at each level the segment crosses.
    levels.forEach((level, j) => {
      if ((level - a.jacobi) * (level - b.jacobi) > 0 || a.jacobi === b.jacobi) return;
      const i = cellIndex(xs, a.x + ((level - a.jacobi) / (b.jacobi - a.jacobi)) * (b.x - a.x));
      if (i < 0) return;
      this.covered.add(edgeKey(id, k, 'x', i, j));
    });
    // Edges along C at each start point the segment crosses.
    xs.forEach((x, i) => {
      if ((x - a.x) * (x - b.x) > 0 || a.x === b.x) return;
      const j = cellIndex(levels, a.jacobi + ((x - a.x) / (b.x - a.x)) * (b.jacobi - a.jacobi));
      if (j < 0) return;
      this.covered.add(edgeKey(id, k, 'jacobi', i, j));
    });
  }
}

interface CurvePoint {
  x: number;
  vy: number;
  jacobi: number;
}

function gridOf(mu: number, p: CurvePoint): string {
  return FamilyCoverage.gridId(axisSegmentOf(mu, p.x), p.vy >= 0 ? 1 : -1);
}

function edgeKey(id: string, k: number, along: 'x' | 'jacobi', i: number, j: number): string {
  return `${id}:${k}:${along}:${i}:${j}`;
}
