// Elliptic restricted three-body problem (Szebehely 1967, ch. 10) in pulsating rotating coordinates
// (lengths in units of the instantaneous primaries' distance), with the true anomaly f of the primaries as
// the independent variable; ' = d/df:
//   x'' − 2y' = Ω_x / (1 + e cos f),   y'' + 2x' = Ω_y / (1 + e cos f),   z'' = Ω_z / (1 + e cos f),
//   Ω = (x² + y² − e z² cos f)/2 + (1 − μ)/r₁ + μ/r₂.
// With e = 0 these are the CR3BP equations with f = t: the factor k = 1/(1 + e cos f) is then exactly 1 and
// the terms are summed in the order of cr3bp/equations-spatial.ts, so the numbers agree bit for bit.
import type { Rhs } from '../dop853/workspace.ts';

export function ellipticEquations(mu: number, eccentricity: number): Rhs {
  if (!(eccentricity >= 0 && eccentricity < 1)) throw new RangeError(`eccentricity must be in [0, 1), got ${eccentricity}`);
  const m1 = 1 - mu;
  const e = eccentricity;
  return (f, s, d) => {
    const x = s[0], y = s[1], z = s[2], vx = s[3], vy = s[4];
    const dx1 = x + mu, dx2 = x - m1;
    const yz2 = y * y + z * z;
    const r1sq = dx1 * dx1 + yz2, r2sq = dx2 * dx2 + yz2;
    const r1c = r1sq * Math.sqrt(r1sq), r2c = r2sq * Math.sqrt(r2sq);
    const a1 = m1 / r1c, a2 = mu / r2c;
    const sum = a1 + a2;
    const ecos = e * Math.cos(f);
    const k = 1 / (1 + ecos);
    const ka1 = k * a1, ka2 = k * a2, ksum = k * sum;
    d[0] = vx;
    d[1] = vy;
    d[2] = s[5];
    d[3] = k * x + 2 * vy - ka1 * dx1 - ka2 * dx2;
    d[4] = k * y - 2 * vx - ksum * y;
    d[5] = -ksum * z - k * ecos * z;
  };
}
