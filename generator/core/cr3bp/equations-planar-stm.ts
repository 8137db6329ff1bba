// Planar CR3BP with the 16 variational equations, Φ (4×4, row-major) in s[4..19].
import { autonomousRhs } from '../dop853/autonomous-rhs.ts';
import type { Rhs } from '../dop853/workspace.ts';

export function planarStmEquations(mu: number): Rhs {
  const m1 = 1 - mu;
  return autonomousRhs((_t, s, d) => {
    const x = s[0], y = s[1], vx = s[2], vy = s[3];
    const dx1 = x + mu, dx2 = x - m1;
    const y2 = y * y;
    const r1sq = dx1 * dx1 + y2, r2sq = dx2 * dx2 + y2;
    const a1 = m1 / (r1sq * Math.sqrt(r1sq)), a2 = mu / (r2sq * Math.sqrt(r2sq));
    const b1 = 3 * a1 / r1sq, b2 = 3 * a2 / r2sq;
    const sum = a1 + a2;
    d[0] = vx;
    d[1] = vy;
    d[2] = x + 2 * vy - a1 * dx1 - a2 * dx2;
    d[3] = y - 2 * vx - sum * y;
    const uxx = 1 - sum + b1 * dx1 * dx1 + b2 * dx2 * dx2;
    const uyy = 1 - sum + (b1 + b2) * y2;
    const uxy = (b1 * dx1 + b2 * dx2) * y;
    for (let j = 0; j < 4; j++) {
      const p0 = s[4 + j], p1 = s[8 + j], p2 = s[12 + j], p3 = s[16 + j];
      d[4 + j] = p2;
      d[8 + j] = p3;
      d[12 + j] = uxx * p0 + uxy * p1 + 2 * p3;
      d[16 + j] = uxy * p0 + uyy * p1 - 2 * p2;
    }
  });
}
