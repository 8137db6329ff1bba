// Which part of the x-axis a point lies on: beyond the larger body, between the bodies, beyond the smaller.
import type { AxisSegment } from './family-job.ts';

export function axisSegmentOf(mu: number, x: number): AxisSegment {
  return x < -mu ? 'far-primary' : x < 1 - mu ? 'between' : 'far-secondary';
}
