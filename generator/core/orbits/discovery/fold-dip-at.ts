// A fold of a family in C hides between two grid points: just below the fold's top level the family's two
// branches cross the level close together, and when both roots fall in one cell ẋ_k keeps its sign at the
// grid points. What the grid does see is a dip of |ẋ_k| toward zero; the parabola through three neighbouring
// points that dips through zero predicts the pair (common practice: bracketing a double root by a quadratic
// model when no sign change is seen).
import { RECORD, residualIndex, type ResidualGrid } from './residual-grid.ts';
import { MAX_CROSSING_TIME_CHANGE } from './zero-set-candidates.ts';

/** Whether the parabola through (x_c−1, x_c, x_c+1) at level j and crossing k dips through zero. */
export function foldDipAt(grid: ResidualGrid, c: number, j: number, k: number): boolean {
  if (c < 1 || c + 1 >= grid.xs.length) return false;
  const r = grid.records;
  const at = [c - 1, c, c + 1].map((i) => residualIndex(grid, i, j, k));
  const f0 = r[at[0]! + RECORD.vx]!, f1 = r[at[1]! + RECORD.vx]!, f2 = r[at[2]! + RECORD.vx]!;
  if (!(f0 * f1 > 0 && f1 * f2 > 0) || Math.abs(f1) > Math.min(Math.abs(f0), Math.abs(f2))) return false;
  const t = at.map((a) => r[a + RECORD.t]!);
  const tMax = Math.max(...t), tMin = Math.min(...t);
  if (!(tMax - tMin <= MAX_CROSSING_TIME_CHANGE * tMax)) return false; // another crossing structure, or none
  const x0 = grid.xs[c - 1]!, x1 = grid.xs[c]!, x2 = grid.xs[c + 1]!;
  const d01 = (f1 - f0) / (x1 - x0), d12 = (f2 - f1) / (x2 - x1);
  const curvature = (d12 - d01) / (x2 - x0);
  if (!(curvature * f1 > 0)) return false;
  const xVertex = (x0 + x1) / 2 - d01 / (2 * curvature);
  const atVertex = f0 + d01 * (xVertex - x0) + curvature * (xVertex - x0) * (xVertex - x1);
  return atVertex * f1 <= 0;
}
