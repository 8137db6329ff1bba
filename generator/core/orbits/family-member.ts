import type { OrbitAnalysis } from './analyse-orbit.ts';

/** One corrected and analysed orbit of a family, at arclength s along the family curve in (x0, vy0). */
export interface FamilyMember {
  x0: number;
  vy0: number;
  /** x of the second perpendicular crossing (at T/2). */
  xHalf: number;
  /** ẏ there (its sign is the start direction of the same orbit seen from that crossing). */
  vyHalf: number;
  tHalfNd: number;
  /** T/2 is the halfCrossings-th crossing of y = 0 (it changes along a family where a tangency to the
   *  x-axis adds or removes a pair of crossings). */
  halfCrossings: number;
  arclength: number;
  analysis: OrbitAnalysis;
  /** Unit tangent of the family curve here, pointing in the direction of growing arclength. */
  tangent: [number, number];
}
