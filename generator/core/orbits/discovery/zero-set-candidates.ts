// The zero set of the residual grid (marching squares over the cells of each crossing count, common
// practice): every edge across which ẋ_k changes sign continuously, grouped into connected pieces.
// A sign change across a jump (the k-th crossing is another crossing at the two ends, where a tangency
// to y = 0 adds or removes a pair of crossings) is no root: its ends disagree in crossing time.
import { RECORD, residualIndex, type ResidualGrid } from './residual-grid.ts';
import type { EndCounts, ZeroCandidate } from './zero-candidate.ts';

/** Largest relative difference of the k-th crossing time between the two ends of a root edge. */
export const MAX_CROSSING_TIME_CHANGE = 0.25;

class UnionFind {
  private readonly parent: Int32Array;
  constructor(size: number) {
    this.parent = new Int32Array(size).map((_, i) => i);
  }
  find(a: number): number {
    let root = a;
    while (this.parent[root] !== root) root = this.parent[root]!;
    while (this.parent[a] !== root) {
      const next = this.parent[a]!;
      this.parent[a] = root;
      a = next;
    }
    return root;
  }
  union(a: number, b: number): void {
    this.parent[this.find(a)] = this.find(b);
  }
}

function lapsAt(grid: ResidualGrid, at: number): EndCounts {
  const { mu, records: r } = grid;
  const startPrimary = grid.segment === 'far-primary' && grid.direction < 0 ? 1 : 0;
  const startSecondary = grid.segment === 'far-secondary' && grid.direction > 0 ? 1 : 0;
  const x = r[at + RECORD.x]!, vy = r[at + RECORD.vy]!;
  // Mirror theorem: the second half repeats the interior crossings of the first, mirrored in y.
  return {
    primaryLaps: 2 * r[at + RECORD.primaryLapsBefore]! + startPrimary + (x < -mu && vy < 0 ? 1 : 0),
    secondaryLaps: 2 * r[at + RECORD.secondaryLapsBefore]! + startSecondary + (x > 1 - mu && vy > 0 ? 1 : 0),
    l1Passages: 2 * r[at + RECORD.neckBefore]!,
  };
}

function rootEdge(grid: ResidualGrid, k: number, i: number, j: number, i2: number, j2: number): ZeroCandidate | null {
  const r = grid.records;
  const a = residualIndex(grid, i, j, k), b = residualIndex(grid, i2, j2, k);
  const fa = r[a + RECORD.vx]!, fb = r[b + RECORD.vx]!;
  if (!(fa * fb < 0)) return null; // NaN at either end fails too
  const ta = r[a + RECORD.t]!, tb = r[b + RECORD.t]!;
  if (Math.abs(ta - tb) > MAX_CROSSING_TIME_CHANGE * Math.max(ta, tb)) return null;
  const f = fa / (fa - fb);
  const lerp = (p: number, q: number) => p + f * (q - p);
  const lapsA = lapsAt(grid, a), lapsB = lapsAt(grid, b);
  const same = lapsA.primaryLaps === lapsB.primaryLaps && lapsA.secondaryLaps === lapsB.secondaryLaps && lapsA.l1Passages === lapsB.l1Passages;
  const x0A = grid.xs[i]!, x0B = grid.xs[i2]!, jacobiA = grid.levels[j]!, jacobiB = grid.levels[j2]!;
  return {
    segment: grid.segment, direction: grid.direction, halfCrossings: k, along: j === j2 ? 'x' : 'jacobi',
    x0A, x0B, jacobiA, jacobiB, vxA: fa, vxB: fb,
    x0Guess: lerp(x0A, x0B), jacobiGuess: lerp(jacobiA, jacobiB),
    tHalfGuessNd: lerp(ta, tb), xHalfGuess: lerp(r[a + RECORD.x]!, r[b + RECORD.x]!),
    laps: same ? [lapsA] : [lapsA, lapsB],
    piece: -1, i, j,
  };
}

/** Every root edge of the grid for crossing counts 1..K, each with the connected piece it lies on. */
export function zeroSetCandidates(grid: ResidualGrid): ZeroCandidate[] {
  const nx = grid.xs.length, nl = grid.levels.length;
  const out: ZeroCandidate[] = [];
  let pieceBase = 0;
  for (let k = 1; k <= grid.maxHalfCrossings; k++) {
    // Edge ids: along x, j·nx + i; along C, nx·nl + j·nx + i.
    const edges = new Map<number, ZeroCandidate>();
    for (let j = 0; j < nl; j++) {
      for (let i = 0; i < nx; i++) {
        const alongX = i + 1 < nx ? rootEdge(grid, k, i, j, i + 1, j) : null;
        if (alongX) edges.set(j * nx + i, alongX);
        const alongC = j + 1 < nl ? rootEdge(grid, k, i, j, i, j + 1) : null;
        if (alongC) edges.set(nx * nl + j * nx + i, alongC);
      }
    }
    const pieces = new UnionFind(2 * nx * nl);
    for (let j = 0; j + 1 < nl; j++) {
      for (let i = 0; i + 1 < nx; i++) {
        // A cell's root edges belong to one piece (its saddle case joins two: harmless, see run-family-job).
        const cell = [j * nx + i, (j + 1) * nx + i, nx * nl + j * nx + i, nx * nl + j * nx + i + 1].filter((id) => edges.has(id));
        for (let c = 1; c < cell.length; c++) pieces.union(cell[0]!, cell[c]!);
      }
    }
    const numbering = new Map<number, number>();
    for (const [id, candidate] of edges) {
      const root = pieces.find(id);
      if (!numbering.has(root)) numbering.set(root, pieceBase + numbering.size);
      candidate.piece = numbering.get(root)!;
      out.push(candidate);
    }
    pieceBase += numbering.size;
  }
  return out;
}
