// The three parts of the x-axis, split by the bodies: beyond the larger body, between them, beyond the smaller.
export type AxisSegment = 'far-primary' | 'between' | 'far-secondary';

/** Which part of the x-axis a point lies on. */
export function axisSegmentOf(mu: number, x: number): AxisSegment {
  return x < -mu ? 'far-primary' : x < 1 - mu ? 'between' : 'far-secondary';
}
