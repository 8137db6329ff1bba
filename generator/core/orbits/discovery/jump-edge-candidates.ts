// Root edges inside grid edges where the crossing structure changes too fast for the grid: the k-th
// crossing time jumps between the edge's ends, or one end reaches the k-th crossing and the other, started
// as well, does not (it ran into a body first). Very unstable orbits have zero sets thinner than the grid
// spacing (ẋ_k crosses zero within ~1e-4 in x0 while the crossing time changes by tens of per cent), and
// families that end at a collision have their last roots beside the colliding starts; and a fold of a family
// in C can put both branches' roots inside one cell (fold-dip-at.ts). Such an edge is sampled again,
// SUBDIVISIONS times finer, and the sub-edges searched like grid edges.
import { axisSpeedSquared } from '../../cr3bp/axis-speed-squared.ts';
import { foldDipAt } from './fold-dip-at.ts';
import { computeResidualGrid, RECORD, residualIndex, type ResidualGrid, type ResidualGridOptions } from './residual-grid.ts';
import type { ZeroCandidate } from './zero-candidate.ts';
import { MAX_CROSSING_TIME_CHANGE, zeroSetCandidates } from './zero-set-candidates.ts';

export const SUBDIVISIONS = 8;

function jumpsAt(grid: ResidualGrid, i: number, j: number): boolean {
  const level = grid.levels[j]!;
  const bothStart = axisSpeedSquared(grid.mu, grid.xs[i]!, level) > 0 && axisSpeedSquared(grid.mu, grid.xs[i + 1]!, level) > 0;
  for (let k = 1; k <= grid.maxHalfCrossings; k++) {
    const a = residualIndex(grid, i, j, k), b = residualIndex(grid, i + 1, j, k);
    const ta = grid.records[a + RECORD.t]!, tb = grid.records[b + RECORD.t]!;
    if (Number.isFinite(ta) && Number.isFinite(tb) && Math.abs(ta - tb) > MAX_CROSSING_TIME_CHANGE * Math.max(ta, tb)) return true;
    if (bothStart && Number.isFinite(ta) !== Number.isFinite(tb)) return true;
    if (foldDipAt(grid, i, j, k) || foldDipAt(grid, i + 1, j, k)) return true;
  }
  return false;
}

/** Candidates found inside the jump edges of a grid, each its own piece (numbered from firstPiece). */
export function jumpEdgeCandidates(grid: ResidualGrid, o: ResidualGridOptions, firstPiece: number, shouldStop?: () => boolean): ZeroCandidate[] | null {
  const out: ZeroCandidate[] = [];
  const nx = grid.xs.length;
  let piece = firstPiece;
  for (let j = 0; j < grid.levels.length; j++) {
    if (shouldStop?.()) return null;
    for (let i = 0; i + 1 < nx; i++) {
      if (!jumpsAt(grid, i, j)) continue;
      const a = grid.xs[i]!, b = grid.xs[i + 1]!;
      const xs = Array.from({ length: SUBDIVISIONS + 1 }, (_, s) => a + ((b - a) * s) / SUBDIVISIONS);
      const fine = computeResidualGrid(grid.mu, grid.segment, grid.direction, xs, [grid.levels[j]!], grid.maxHalfCrossings, o);
      if (!fine) continue;
      for (const c of zeroSetCandidates(fine)) out.push({ ...c, i, j, piece: piece++, withinEdge: true });
    }
  }
  return out;
}
