// Spatial CR3BP with the 36 variational equations Φ' = A(t) Φ, A = [[0, I], [Ω_rr, 2J]], Φ row-major
// in s[6..41] (common practice; Szebehely 1967 for the Hessian of Ω).
import { autonomousRhs } from '../dop853/autonomous-rhs.ts';
import type { Rhs } from '../dop853/workspace.ts';

export function spatialStmEquations(mu: number): Rhs {
  const m1 = 1 - mu;
  return autonomousRhs((_t, s, d) => {
    const x = s[0], y = s[1], z = s[2], vx = s[3], vy = s[4];
    const dx1 = x + mu, dx2 = x - m1;
    const yz2 = y * y + z * z;
    const r1sq = dx1 * dx1 + yz2, r2sq = dx2 * dx2 + yz2;
    const r1 = Math.sqrt(r1sq), r2 = Math.sqrt(r2sq);
    const a1 = m1 / (r1sq * r1), a2 = mu / (r2sq * r2);
    const b1 = 3 * a1 / r1sq, b2 = 3 * a2 / r2sq;
    const sum = a1 + a2;
    d[0] = vx;
    d[1] = vy;
    d[2] = s[5];
    d[3] = x + 2 * vy - a1 * dx1 - a2 * dx2;
    d[4] = y - 2 * vx - sum * y;
    d[5] = -sum * z;
    // Hessian of the effective potential Ω.
    const uxx = 1 - sum + b1 * dx1 * dx1 + b2 * dx2 * dx2;
    const uyy = 1 - sum + (b1 + b2) * y * y;
    const uzz = -sum + (b1 + b2) * z * z;
    const uxy = (b1 * dx1 + b2 * dx2) * y;
    const uxz = (b1 * dx1 + b2 * dx2) * z;
    const uyz = (b1 + b2) * y * z;
    for (let j = 0; j < 6; j++) {
      const p0 = s[6 + j], p1 = s[12 + j], p2 = s[18 + j], p3 = s[24 + j], p4 = s[30 + j];
      d[6 + j] = p3;
      d[12 + j] = p4;
      d[18 + j] = s[36 + j];
      d[24 + j] = uxx * p0 + uxy * p1 + uxz * p2 + 2 * p4;
      d[30 + j] = uxy * p0 + uyy * p1 + uyz * p2 - 2 * p3;
      d[36 + j] = uxz * p0 + uyz * p1 + uzz * p2;
    }
  });
}
