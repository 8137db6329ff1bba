// Two Earth–Moon orbits for the beyond-the-CR3BP tests, computed (not copied) with the generator's own job:
//  - a member of the stable window of the E1M1 family seeded on the far side of the Earth (ẏ < 0): a full
//    run of that family (scratch/lyap.ts E1M1) shows a window at C ≈ 3.04504 … 3.04667, so one scan at
//    C = 3.0458, inside it, yields a member with |ν| < 1 (the tests check |ν| < 1 before relying on it);
//  - a planar L1 Lyapunov orbit of amplitude 0.01 (≈ 3800 km), violently unstable (ν ~ 1e3; Richardson 1980
//    for the first guess, corrected by the generator's fixed-x0 Newton).
import { analyseOrbit, type OrbitAnalysis } from '../../../generator/core/orbits/analyse-orbit.ts';
import { correctAtFixedX0 } from '../../../generator/core/orbits/correct-on-arc.ts';
import { lyapunovGuess } from '../../../generator/core/orbits/reference-seeds.ts';
import { runFamilyJob } from '../../../generator/core/orbits/run-family-job.ts';
import { lagrangePoints } from '../../../generator/core/cr3bp/lagrange-points.ts';
import { findSystemPreset, massRatioOf, timeUnitSecondsOf } from '../../../generator/core/cr3bp/system-presets.ts';
import type { SystemSpec } from '../../../generator/core/orbits/family-job.ts';

const preset = findSystemPreset('earth-moon');
export const MU = massRatioOf(preset);
export const TIME_UNIT_DAYS = timeUnitSecondsOf(preset) / 86400;
export const LENGTH_UNIT_KM = preset.lengthUnitKm;
const SYSTEM: SystemSpec = { ...preset, mu: MU, timeUnitS: timeUnitSecondsOf(preset) };
const TOLERANCE = { rtol: 1e-12, atol: 1e-12 };

export interface TestOrbit {
  state0: [number, number, number, number, number, number];
  periodNd: number;
  analysis: OrbitAnalysis;
}

const context = () => ({ mu: MU, xL1: lagrangePoints(MU)[0].x, ...TOLERANCE });

/** The E1M1 member of the stable window closest to ν = 0 found by a scan at C = 3.0458. */
export function stableE1M1(): TestOrbit {
  const result = runFamilyJob({
    key: 'test:beyond-E1M1', name: 'E1M1 stable member (test)', system: SYSTEM,
    seed: { kind: 'lap-signature', signature: 'E1M1', jacobiValues: [3.0458], segments: ['far-primary'], directions: [-1], maxHalfCrossings: 1, gridPoints: 80 },
    limits: { maxMembers: 1, jacobiMin: 2.9, jacobiMax: 3.3, maxPeriodNd: 40, unstableStop: { indexAbove: 1e5, members: 40 }, initialStepNd: 1e-3, maxStepNd: 0.05 },
    tolerance: TOLERANCE, indexTolerance: 1e-6,
  });
  const orbits = result.bundles.flatMap((b) => b.orbits);
  if (orbits.length === 0) throw new Error('no E1M1 orbit found at C = 3.0458');
  const best = orbits.reduce((a, b) => (Math.abs(b.stabilityIndex) < Math.abs(a.stabilityIndex) ? b : a));
  return { state0: best.state0, periodNd: best.period, analysis: analyseOrbit(context(), best.state0[0], best.state0[4], best.period) };
}

/** Planar L1 Lyapunov orbit of amplitude 0.01 (nondimensional). */
export function lyapunovL1(): TestOrbit {
  const xL1 = lagrangePoints(MU)[0].x;
  const [x0, vy0] = lyapunovGuess(MU, xL1, 0.01);
  const corrector = { ...TOLERANCE, maxTimeNd: 10, residualTolerance: 1e-11, maxIterations: 12 };
  const corrected = correctAtFixedX0(MU, 1, x0, vy0, corrector) ?? correctAtFixedX0(MU, 1, x0, -vy0, corrector);
  if (!corrected) throw new Error('L1 Lyapunov orbit did not converge');
  const periodNd = 2 * corrected.shot.tHalfNd;
  return {
    state0: [corrected.x0, 0, 0, 0, corrected.vy0, 0],
    periodNd,
    analysis: analyseOrbit(context(), corrected.x0, corrected.vy0, periodNd),
  };
}
