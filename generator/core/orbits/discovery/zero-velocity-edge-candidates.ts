// Root edges between the last reachable grid point of a level and the zero-velocity curve. Near the curve
// the perpendicular start speed falls like a square root, so the zero set crowds against it: orbits that
// start close to a brake orbit (ẏ0 a few per cent of the grid's speeds) have their roots inside the last
// cell before the curve, where the grid has no second point. That cell is sampled again, up to the curve
// itself (where the start is at rest), denser toward it, and searched like grid edges.
import { axisSpeedSquared } from '../../cr3bp/axis-speed-squared.ts';
import { computeResidualGrid, type ResidualGrid, type ResidualGridOptions } from './residual-grid.ts';
import type { ZeroCandidate } from './zero-candidate.ts';
import { zeroSetCandidates } from './zero-set-candidates.ts';

export const ZERO_VELOCITY_SAMPLES = 12;

/** x between a (reachable) and b (not) where the start speed vanishes, by bisection to round-off. */
function zeroVelocityPoint(mu: number, a: number, b: number, jacobi: number): number {
  for (let n = 0; n < 60; n++) {
    const mid = 0.5 * (a + b);
    if (axisSpeedSquared(mu, mid, jacobi) > 0) a = mid;
    else b = mid;
  }
  return a;
}

/** Candidates found in the cells that border the zero-velocity curve, each its own piece (from firstPiece). */
export function zeroVelocityEdgeCandidates(grid: ResidualGrid, o: ResidualGridOptions, firstPiece: number, shouldStop?: () => boolean): ZeroCandidate[] | null {
  const out: ZeroCandidate[] = [];
  const { mu, xs } = grid;
  let piece = firstPiece;
  for (let j = 0; j < grid.levels.length; j++) {
    if (shouldStop?.()) return null;
    const jacobi = grid.levels[j]!;
    for (let i = 0; i + 1 < xs.length; i++) {
      const inA = axisSpeedSquared(mu, xs[i]!, jacobi) > 0, inB = axisSpeedSquared(mu, xs[i + 1]!, jacobi) > 0;
      if (inA === inB) continue;
      const inside = inA ? xs[i]! : xs[i + 1]!;
      const edge = zeroVelocityPoint(mu, inside, inA ? xs[i + 1]! : xs[i]!, jacobi);
      // From the grid point to the curve, denser toward it (speed ∝ √distance); the last sample starts at rest.
      const samples = Array.from({ length: ZERO_VELOCITY_SAMPLES + 1 }, (_, s) => inside + (edge - inside) * (1 - (1 - s / ZERO_VELOCITY_SAMPLES) ** 2));
      const fine = computeResidualGrid(mu, grid.segment, grid.direction, samples.sort((p, q) => p - q), [jacobi], grid.maxHalfCrossings, o);
      if (!fine) continue;
      for (const c of zeroSetCandidates(fine)) out.push({ ...c, i, j, piece: piece++, withinEdge: true });
    }
  }
  return out;
}
