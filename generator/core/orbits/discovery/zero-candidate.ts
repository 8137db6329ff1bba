import type { AxisSegment } from '../family-job.ts';
import type { LapCounts } from '../../cr3bp/lap-signature.ts';

/**
 * A grid edge across which the perpendicular-crossing residual ẋ_k changes sign continuously: a point of
 * the zero set of G_k(x0, C), i.e. (up to the grid's resolution) a symmetric periodic orbit.
 */
export interface EndCounts extends LapCounts {
  l1Passages: number;
}

export interface ZeroCandidate {
  segment: AxisSegment;
  direction: 1 | -1;
  halfCrossings: number;
  /** The edge runs along x0 at a fixed level, or along C at a fixed x0. */
  along: 'x' | 'jacobi';
  x0A: number;
  x0B: number;
  jacobiA: number;
  jacobiB: number;
  vxA: number;
  vxB: number;
  /** Linear interpolation of the root on the edge. */
  x0Guess: number;
  jacobiGuess: number;
  tHalfGuessNd: number;
  xHalfGuess: number;
  /**
   * Lap counts and L1 neck passages over a period of the orbit at either end of the edge (one entry when
   * both ends agree). The root between them may have either end's counts, so each end is kept whole: a
   * root whose one end stays at the smaller body while the other passes the neck is still a cycler seed.
   */
  laps: EndCounts[];
  /** Connected piece of the zero set (per segment, direction and crossing count) the edge belongs to. */
  piece: number;
  /** Grid indices of the edge's first end (x index, level index). */
  i: number;
  j: number;
  /** Found by sampling inside a grid edge whose crossing structure jumps (jump-edge-candidates.ts): the
   *  edge's coverage by a continued family does not speak for it. */
  withinEdge?: boolean;
}
