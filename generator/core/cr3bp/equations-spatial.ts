// CR3BP equations of motion in the rotating frame (Szebehely 1967, ch. 1): primaries 1 − μ at (−μ, 0, 0)
// and μ at (1 − μ, 0, 0), angular rate 1. State x, y, z, vx, vy, vz.
import { autonomousRhs } from '../dop853/autonomous-rhs.ts';
import type { Rhs } from '../dop853/workspace.ts';

export function spatialEquations(mu: number): Rhs {
  const m1 = 1 - mu;
  return autonomousRhs((_t, s, d) => {
    const x = s[0], y = s[1], z = s[2], vx = s[3], vy = s[4];
    const dx1 = x + mu, dx2 = x - m1;
    const yz2 = y * y + z * z;
    const r1sq = dx1 * dx1 + yz2, r2sq = dx2 * dx2 + yz2;
    const r1c = r1sq * Math.sqrt(r1sq), r2c = r2sq * Math.sqrt(r2sq);
    const a1 = m1 / r1c, a2 = mu / r2c;
    const sum = a1 + a2;
    d[0] = vx;
    d[1] = vy;
    d[2] = s[5];
    d[3] = x + 2 * vy - a1 * dx1 - a2 * dx2;
    d[4] = y - 2 * vx - sum * y;
    d[5] = -sum * z;
  });
}
