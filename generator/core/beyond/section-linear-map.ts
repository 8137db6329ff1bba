// Linearisation of the Poincaré return map at fixed Jacobi constant on the section y = 0 through a periodic
// orbit's start, in the section coordinates (x, ẋ) — canonical there, since p_x = ẋ − y = ẋ on y = 0, so the
// map preserves area and its 2×2 linearisation has determinant 1 and trace 2ν (ν the in-plane stability
// index; Hénon 1973, A&A 28).
// From the planar monodromy Φ: a start offset (δx, δẋ) gets δẏ = −(C_x δx + C_ẋ δẋ)/C_ẏ to keep C, then
// δs(T) = Φ δs0, and the crossing-time correction δt = −δy(T)/ẏ moves the end back onto y = 0 (as
// orbits/half-period-shot.ts does for the corrector; Howell 1984).
import { planarEquations } from '../cr3bp/equations-planar.ts';
import { propagate } from '../propagation/propagate.ts';

export interface SectionLinearMap {
  /** [[a, b], [c, d]] acting on (δx, δẋ). */
  a: number;
  b: number;
  c: number;
  d: number;
}

export function sectionLinearMap(mu: number, x0: number, vx0: number, vy0: number, periodNd: number, rtol = 1e-12, atol = 1e-12): SectionLinearMap {
  const run = propagate(mu, [x0, 0, vx0, vy0], periodNd, { rtol, atol, stm: true });
  const phi = run.stm!;
  const P = (i: number, j: number) => phi[4 * i + j];
  // ∂C/∂x = 2 Ω_x, ∂C/∂ẋ = −2ẋ, ∂C/∂ẏ = −2ẏ at the start (y = 0).
  const r1 = Math.abs(x0 + mu), r2 = Math.abs(x0 - 1 + mu);
  const omegaX = x0 - ((1 - mu) * (x0 + mu)) / r1 ** 3 - (mu * (x0 - 1 + mu)) / r2 ** 3;
  const kx = -(2 * omegaX) / (-2 * vy0); // δẏ per δx
  const kv = -(-2 * vx0) / (-2 * vy0); // δẏ per δẋ
  // Columns of Φ·B: responses to δx and δẋ with the matching δẏ.
  const col = (j: number, k: number) => [0, 1, 2, 3].map((i) => P(i, j) + k * P(i, 3));
  const ex = col(0, kx), ev = col(2, kv);
  const end = run.state;
  const f = new Float64Array(4);
  planarEquations(mu)(periodNd, end, f);
  const vyEnd = end[3];
  // Rows: δx and δẋ after the crossing-time correction.
  const row = (k: number, s: number[]) => s[k] - (f[k] / vyEnd) * s[1];
  return { a: row(0, ex), b: row(0, ev), c: row(2, ex), d: row(2, ev) };
}
