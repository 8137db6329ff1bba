// Cost per member of the "beyond the three-body model" numerics (generator/core/beyond): the hold radius
// (200 returns per trial, tolerance 1e-10, and 1e-12 for comparison) and the two screenings (8 phases,
// 12 synodic months, tolerance 1e-10), on a stable E1M1 cycler of the Earth–Moon system (found by a
// one-Jacobi scan, as in test/beyond/helpers/earth-moon-orbits.ts) and on an unstable L1 Lyapunov orbit.
import { holdRadius, screenInModel } from '../generator/core/beyond/index.ts';
import { lyapunovL1, LENGTH_UNIT_KM, MU, stableE1M1, TIME_UNIT_DAYS } from '../test/beyond/helpers/earth-moon-orbits.ts';

const SYNODIC_MONTH_DAYS = 29.530589;
const SPAN_ND = (12 * SYNODIC_MONTH_DAYS) / TIME_UNIT_DAYS;

function timed<T>(work: () => T): [T, number] {
  const t0 = performance.now();
  const value = work();
  return [value, (performance.now() - t0) / 1000];
}

export async function run(): Promise<void> {
  const [stable, findS] = timed(stableE1M1);
  const [lyapunov] = timed(lyapunovL1);
  console.log(`stable E1M1 member: C from scan 3.0458, ν = ${stable.analysis.stabilityIndex.toFixed(4)}, period ${(stable.periodNd * TIME_UNIT_DAYS).toFixed(2)} d (found in ${findS.toFixed(2)} s, not counted below)`);
  console.log(`L1 Lyapunov (amplitude 0.01): ν = ${lyapunov.analysis.stabilityIndex.toFixed(0)}, period ${(lyapunov.periodNd * TIME_UNIT_DAYS).toFixed(2)} d`);

  for (const tol of [1e-10, 1e-12]) {
    for (const side of [1, -1] as const) {
      const [r, s] = timed(() => holdRadius({ mu: MU, state0: stable.state0, periodNd: stable.periodNd, rtol: tol, atol: tol, side }));
      const returns = r.trials.reduce((n, t) => n + t.returns, 0);
      console.log(`hold radius (tol ${tol}, side ${side > 0 ? '+x' : '−x'}): ${(r.holdRadiusNd * LENGTH_UNIT_KM).toFixed(1)} km `
        + `(fails at ${(r.failingDisplacementNd * LENGTH_UNIT_KM).toFixed(1)} km), ${r.trials.length} trials, ${returns} returns: ${s.toFixed(2)} s per member`);
    }
  }
  const [h, hs] = timed(() => holdRadius({ mu: MU, state0: lyapunov.state0, periodNd: lyapunov.periodNd }));
  console.log(`hold radius of the L1 Lyapunov orbit: ${h.holdRadiusNd} (${h.trials.length} trial): ${hs.toFixed(3)} s`);

  for (const [label, orbit] of [['stable E1M1', stable], ['L1 Lyapunov', lyapunov]] as const) {
    for (const model of ['bicircular', 'elliptic'] as const) {
      const [r, s] = timed(() => screenInModel({ model, mu: MU, state0: orbit.state0, periodNd: orbit.periodNd, laps: orbit.analysis.laps, spanNd: SPAN_ND }));
      const broken = r.phases.map((p) => p.firstBrokenPeriod ?? '-').join(' ');
      console.log(`screening ${label} in the ${model} model: surviving ${(100 * r.survivingFraction).toFixed(0)} % of 8 phases, `
        + `first broken period per phase [${broken}]: ${s.toFixed(2)} s per member`);
    }
  }
}
