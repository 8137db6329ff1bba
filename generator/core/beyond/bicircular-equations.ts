// Bicircular restricted four-body model (Huang 1960; Simó, Gómez, Jorba & Masdemont 1995) in the Earth–Moon
// rotating frame: the CR3BP plus a Sun of mass m_s on a circle of radius a_s about the Earth–Moon barycentre,
// at (a_s cos θ, a_s sin θ, 0) with θ = θ0 + ω_s t. The Sun's pull on the particle minus its pull on the
// barycentre (the indirect term m_s/a_s² (cos θ, sin θ)), which is what acts in a frame centred on the
// barycentre:  ẍ − 2ẏ = Ω_x − m_s (x − x_s)/r_s³ − m_s cos θ / a_s², and alike for y; z̈ = Ω_z − m_s z / r_s³.
// The model is not coherent (the primaries do not feel the Sun), as Simó et al. point out.
import { spatialEquations } from '../cr3bp/equations-spatial.ts';
import type { Rhs } from '../dop853/workspace.ts';
import type { BicircularParameters } from './bicircular-parameters.ts';

export function bicircularEquations(mu: number, sun: BicircularParameters): Rhs {
  // The CR3BP part is the CR3BP's own right-hand side, so that sunMass = 0 gives the same numbers.
  const cr3bp = spatialEquations(mu);
  const ms = sun.sunMass;
  const as = sun.sunDistanceNd;
  const indirect = ms / (as * as);
  const rate = sun.sunRateNd;
  const phase = sun.sunPhaseRad;
  return (t, s, d) => {
    cr3bp(t, s, d);
    const x = s[0], y = s[1], z = s[2];
    const theta = phase + rate * t;
    const c = Math.cos(theta), sn = Math.sin(theta);
    const dxs = x - as * c, dys = y - as * sn;
    const rssq = dxs * dxs + dys * dys + z * z;
    const asun = ms / (rssq * Math.sqrt(rssq));
    d[3] -= asun * dxs + indirect * c;
    d[4] -= asun * dys + indirect * sn;
    d[5] -= asun * z;
  };
}
