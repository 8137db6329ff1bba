// Re-analysis of a stored orbit with nothing from generator/: the odex flow of helpers/odex-flow.ts gives the
// monodromy, the indices come from its blocks (Hénon 1973, A&A 28: ν = (tr M_plane − 2)/2 over
// (x, y, vx, vy), ν_z = tr M_z / 2 over (z, vz)), and y = 0 crossings come from odex's dense output.
import { Solver } from 'odex';
import { odexFlow } from './odex-flow.ts';

export interface StoredOrbit {
  state0: readonly number[];
  period: number;
}

export interface IndependentIndices {
  inPlane: number;
  vertical: number;
  monodromy: number[];
}

export function independentIndices(mu: number, orbit: StoredOrbit): IndependentIndices {
  const m = odexFlow(mu, orbit.state0, orbit.period, { stm: true }).stm!;
  const at = (i: number, j: number) => m[6 * i + j];
  return {
    inPlane: (at(0, 0) + at(1, 1) + at(3, 3) + at(4, 4) - 2) / 2,
    vertical: (at(2, 2) + at(5, 5)) / 2,
    monodromy: m,
  };
}

/** |λ| of the larger in-plane multiplier for a stability index ν: |ν| + √(ν² − 1) (1 when |ν| ≤ 1). */
export function largestMultiplier(index: number): number {
  return Math.abs(index) >= 1 ? Math.abs(index) + Math.sqrt(index * index - 1) : 1;
}

export interface Crossing {
  tNd: number;
  x: number;
  vy: number;
}

/** Every crossing of y = 0 strictly inside (0, durationNd), from odex's dense output refined by bisection. */
export function axisCrossings(mu: number, state0: readonly number[], durationNd: number): Crossing[] {
  const m1 = 1 - mu;
  const f = (_t: number, s: number[]): number[] => {
    const [x, y, z, vx, vy, vz] = s;
    const r1 = Math.hypot(x + mu, y, z), r2 = Math.hypot(x - m1, y, z);
    const g1 = m1 / r1 ** 3, g2 = mu / r2 ** 3;
    return [vx, vy, vz, x + 2 * vy - g1 * (x + mu) - g2 * (x - m1), y - 2 * vx - (g1 + g2) * y, -(g1 + g2) * z];
  };
  const solver = new Solver(6);
  solver.absoluteTolerance = 1e-13;
  solver.relativeTolerance = 1e-13;
  solver.maxSteps = 1_000_000;
  solver.denseOutput = true;
  const crossings: Crossing[] = [];
  const edge = 1e-7 * durationNd;
  solver.solve(f, 0, [...state0], durationNd, (_nr, tOld, t, _y, dense) => {
    if (!dense || t === tOld) return;
    const samples = 8;
    for (let k = 0; k < samples; k++) {
      let a = tOld + ((t - tOld) * k) / samples, b = tOld + ((t - tOld) * (k + 1)) / samples;
      let ya = dense(1, a);
      const yb = dense(1, b);
      if (!(ya * yb < 0)) continue;
      for (let i = 0; i < 200 && b - a > 1e-15; i++) {
        const c = 0.5 * (a + b), yc = dense(1, c);
        if (ya * yc <= 0) b = c;
        else { a = c; ya = yc; }
      }
      const tc = 0.5 * (a + b);
      if (tc > edge && tc < durationNd - edge) crossings.push({ tNd: tc, x: dense(0, tc), vy: dense(4, tc) });
    }
  });
  return crossings;
}
