// Planar CR3BP (the z = 0 case of equations-spatial.ts). State x, y, vx, vy.
import { autonomousRhs } from '../dop853/autonomous-rhs.ts';
import type { Rhs } from '../dop853/workspace.ts';

export function planarEquations(mu: number): Rhs {
  const m1 = 1 - mu;
  return autonomousRhs((_t, s, d) => {
    const x = s[0], y = s[1], vx = s[2], vy = s[3];
    const dx1 = x + mu, dx2 = x - m1;
    const y2 = y * y;
    const r1sq = dx1 * dx1 + y2, r2sq = dx2 * dx2 + y2;
    const a1 = m1 / (r1sq * Math.sqrt(r1sq)), a2 = mu / (r2sq * Math.sqrt(r2sq));
    d[0] = vx;
    d[1] = vy;
    d[2] = x + 2 * vy - a1 * dx1 - a2 * dx2;
    d[3] = y - 2 * vx - (a1 + a2) * y;
  });
}
