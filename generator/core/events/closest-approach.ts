import type { EventSpec } from './event-spec.ts';

/**
 * Local minima of the distance to a point on the x-axis (a primary at (xBody, 0, 0)):
 * roots of ½ d(r²)/dt = (x − xBody)·vx + y·vy + z·vz going from negative to positive.
 */
export function closestApproach(xBody: number, label: string): EventSpec {
  return {
    label,
    g: (_t, s) => (s[0] - xBody) * s[3] + s[1] * s[4] + s[2] * s[5],
    direction: 1,
  };
}
