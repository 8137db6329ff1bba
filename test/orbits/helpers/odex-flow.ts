// An independent flow for cross-checks: the CR3BP equations and their variational equations written out here
// from the textbook form (Szebehely 1967, ch. 1 and 10: ẍ − 2ẏ = Ωx, ÿ + 2ẋ = Ωy, z̈ = Ωz), integrated by
// odex (Hairer & Wanner's Gragg–Bulirsch–Stoer extrapolation code, an npm reference library; DESIGN.md).
// Nothing here comes from generator/: a wrong equation or integrator there cannot hide behind this one.
import { Solver } from 'odex';

export interface OdexFlowResult {
  /** x, y, z, vx, vy, vz at the end. */
  state: number[];
  /** 6×6 state-transition matrix, row-major, when asked. */
  stm: number[] | null;
}

/** Second derivatives of Ω = (x² + y²)/2 + (1−μ)/r₁ + μ/r₂ (Hessian), as [xx, yy, zz, xy, xz, yz]. */
function omegaHessian(mu: number, x: number, y: number, z: number): number[] {
  const m1 = 1 - mu;
  const p1 = [x + mu, y, z];
  const p2 = [x - m1, y, z];
  const r1 = Math.hypot(p1[0], p1[1], p1[2]);
  const r2 = Math.hypot(p2[0], p2[1], p2[2]);
  const k1 = m1 / r1 ** 3, k2 = mu / r2 ** 3;
  const q1 = (3 * m1) / r1 ** 5, q2 = (3 * mu) / r2 ** 5;
  const h = (i: number, j: number) => (i === j && i < 2 ? 1 : 0) - (i === j ? k1 + k2 : 0) + q1 * p1[i] * p1[j] + q2 * p2[i] * p2[j];
  return [h(0, 0), h(1, 1), h(2, 2), h(0, 1), h(0, 2), h(1, 2)];
}

function rhs(mu: number, withStm: boolean) {
  const m1 = 1 - mu;
  return (_t: number, s: number[]): number[] => {
    const [x, y, z, vx, vy, vz] = s;
    const r1 = Math.hypot(x + mu, y, z), r2 = Math.hypot(x - m1, y, z);
    const g1 = m1 / r1 ** 3, g2 = mu / r2 ** 3;
    const d = [vx, vy, vz, x + 2 * vy - g1 * (x + mu) - g2 * (x - m1), y - 2 * vx - (g1 + g2) * y, -(g1 + g2) * z];
    if (!withStm) return d;
    // Φ̇ = A Φ with A = [[0, I], [H, 2K]], K = [[0, 1, 0], [−1, 0, 0], [0, 0, 0]] (Coriolis terms).
    const [hxx, hyy, hzz, hxy, hxz, hyz] = omegaHessian(mu, x, y, z);
    const phi = (i: number, j: number) => s[6 + 6 * i + j];
    const out = new Array<number>(36);
    for (let j = 0; j < 6; j++) {
      const px = phi(0, j), py = phi(1, j), pz = phi(2, j), pvx = phi(3, j), pvy = phi(4, j), pvz = phi(5, j);
      out[0 * 6 + j] = pvx;
      out[1 * 6 + j] = pvy;
      out[2 * 6 + j] = pvz;
      out[3 * 6 + j] = hxx * px + hxy * py + hxz * pz + 2 * pvy;
      out[4 * 6 + j] = hxy * px + hyy * py + hyz * pz - 2 * pvx;
      out[5 * 6 + j] = hxz * px + hyz * py + hzz * pz;
    }
    return d.concat(out);
  };
}

/** Propagates a spatial state over durationNd with odex at the given tolerance (optionally with the STM). */
export function odexFlow(mu: number, state0: readonly number[], durationNd: number, options: { tolerance?: number; stm?: boolean } = {}): OdexFlowResult {
  const withStm = options.stm ?? false;
  const n = withStm ? 42 : 6;
  const solver = new Solver(n);
  solver.absoluteTolerance = options.tolerance ?? 1e-13;
  solver.relativeTolerance = options.tolerance ?? 1e-13;
  solver.maxSteps = 1_000_000;
  const y0 = [...state0];
  if (withStm) for (let k = 0; k < 36; k++) y0.push(k % 7 === 0 ? 1 : 0);
  const result = solver.solve(rhs(mu, withStm), 0, y0, durationNd);
  if (result.outcome !== 0) throw new Error(`odex did not converge (outcome ${result.outcome})`);
  return { state: result.y.slice(0, 6), stm: withStm ? result.y.slice(6) : null };
}

/**
 * Smallest distance to each body at (xBody, 0, 0) over [0, durationNd]: the start and end points and every local
 * minimum, found where the radial velocity (r − r_body)·v turns from negative to positive on a fine grid of odex's
 * dense output, refined by bisection.
 */
export function odexMinDistances(mu: number, state0: readonly number[], durationNd: number, xBodies: readonly number[]): number[] {
  const solver = new Solver(6);
  solver.absoluteTolerance = 1e-13;
  solver.relativeTolerance = 1e-13;
  solver.maxSteps = 1_000_000;
  solver.denseOutput = true;
  const distance = (s: readonly number[], xBody: number) => Math.hypot(s[0] - xBody, s[1], s[2]);
  const best = xBodies.map((xBody) => distance(state0, xBody));
  const result = solver.solve(rhs(mu, false), 0, [...state0], durationNd, (_nr, tOld, t, _y, dense) => {
    if (!dense || t === tOld) return;
    const state = (u: number) => [0, 1, 2, 3, 4, 5].map((c) => dense(c, u));
    xBodies.forEach((xBody, body) => {
      const radialSpeed = (u: number) => {
        const s = state(u);
        return (s[0] - xBody) * s[3] + s[1] * s[4] + s[2] * s[5];
      };
      const samples = 16;
      let a = tOld, ga = radialSpeed(a);
      for (let k = 1; k <= samples; k++) {
        const b = tOld + ((t - tOld) * k) / samples, gb = radialSpeed(b);
        if (ga < 0 && gb >= 0) {
          let lo = a, hi = b;
          for (let i = 0; i < 200 && hi - lo > 1e-15; i++) {
            const mid = 0.5 * (lo + hi);
            if (radialSpeed(mid) < 0) lo = mid;
            else hi = mid;
          }
          best[body] = Math.min(best[body], distance(state(0.5 * (lo + hi)), xBody));
        }
        a = b;
        ga = gb;
      }
    });
  });
  if (result.outcome !== 0) throw new Error(`odex did not converge (outcome ${result.outcome})`);
  return best.map((d, body) => Math.min(d, distance(result.y, xBodies[body])));
}
