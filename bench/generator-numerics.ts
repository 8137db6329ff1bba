// Speed of the orbit-family numerics on Earth–Moon (rtol = atol = 1e-12, as the catalog jobs run):
//  1. seed search at one Jacobi constant: one axis segment, both start directions (scanAxisSegment);
//  2. correction of one member: a seed by Newton on ẏ₀ (x₀ fixed), one pseudo-arclength step, and the
//     full-period analysis every member gets (6×6 STM and events);
//  3. continuation of one family: members per second (correction + analysis + step control), for the L1
//     Lyapunov family and for an E1M1 cycler family.
// Medians over the repetitions are the figures; minima are printed too because a busy machine inflates medians.
import {
  analyseOrbit, correctAtFixedX0, correctOnArc, findSystemPreset, lagrangePoints, lyapunovGuess, massRatioOf,
  scanAxisSegment, type AnalysisContext,
} from '../generator/core/index.ts';
import { continueFamily, memberFrom, type ContinuationRules } from '../generator/core/orbits/continue-family.ts';
import type { CorrectorOptions } from '../generator/core/orbits/correct-on-arc.ts';
import type { SeedCandidate } from '../generator/core/orbits/scan-axis-segment.ts';

const preset = findSystemPreset('earth-moon');
const MU = massRatioOf(preset);
const TOLERANCE = 1e-12;
const JACOBI = 3.05;
const GRID_POINTS = 150;
const MAX_HALF_CROSSINGS = 5;
const PRIMARY_RADIUS_ND = preset.primaryRadiusKm / preset.lengthUnitKm;
const SECONDARY_RADIUS_ND = preset.secondaryRadiusKm / preset.lengthUnitKm;
const X_L1 = lagrangePoints(MU)[0].x;
const MAX_PERIOD_ND = 40;

const context: AnalysisContext = { mu: MU, xL1: X_L1, rtol: TOLERANCE, atol: TOLERANCE };
const corrector: CorrectorOptions = {
  rtol: TOLERANCE, atol: TOLERANCE, maxTimeNd: MAX_PERIOD_ND, residualTolerance: 2e-11, maxIterations: 12,
};

function timed<T>(work: () => T): { value: T; ms: number } {
  const start = performance.now();
  const value = work();
  return { value, ms: performance.now() - start };
}

function stats(values: number[]): string {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  const median = sorted.length % 2 ? sorted[mid] : 0.5 * (sorted[mid - 1] + sorted[mid]);
  return `median ${median.toFixed(1)} ms (min ${sorted[0].toFixed(1)}, n = ${values.length})`;
}

function repeat(times: number, work: () => unknown): number[] {
  const ms: number[] = [];
  for (let i = 0; i < times; i++) ms.push(timed(work).ms);
  return ms;
}

function seedSearch(): SeedCandidate[] {
  const options = {
    rtol: TOLERANCE, atol: TOLERANCE, maxHalfTimeNd: MAX_PERIOD_ND / 2, primaryRadiusNd: PRIMARY_RADIUS_ND,
    secondaryRadiusNd: SECONDARY_RADIUS_ND, xL1: X_L1, reachNd: 1.2,
  };
  const found: SeedCandidate[] = [];
  const perDirection: string[] = [];
  const total = timed(() => {
    for (const direction of [1, -1] as const) {
      const run = timed(() => scanAxisSegment(MU, JACOBI, 'far-primary', direction, MAX_HALF_CROSSINGS, GRID_POINTS, options));
      found.push(...run.value);
      perDirection.push(`ẏ ${direction > 0 ? '+' : '−'}: ${(run.ms / 1000).toFixed(2)} s, ${run.value.length} roots`);
    }
  });
  console.log(`seed search, C = ${JACOBI}, far side of the Earth, ${GRID_POINTS} start points, up to ${MAX_HALF_CROSSINGS} crossings, both directions:`);
  console.log(`  ${(total.ms / 1000).toFixed(2)} s in all (${perDirection.join('; ')})`);
  return found;
}

function rulesFor(maxMembers: number, laps: ContinuationRules['laps'], needsNeckPassage: boolean): ContinuationRules {
  return {
    maxMembers, jacobiMin: 2.9, jacobiMax: 3.3, maxPeriodNd: MAX_PERIOD_ND, unstableStop: { indexAbove: 1e5, members: 40 },
    initialStepNd: 1e-3, maxStepNd: 0.05, minStepNd: 1e-9, maxIndexJump: 0.25, maxPeriodJump: 0.02,
    primaryRadiusNd: PRIMARY_RADIUS_ND, secondaryRadiusNd: SECONDARY_RADIUS_ND, laps, needsNeckPassage,
  };
}

function continuation(label: string, halfCrossings: number, x0: number, vy0: number, rules: ContinuationRules): void {
  const seed = correctAtFixedX0(MU, halfCrossings, x0, vy0, corrector);
  if (!seed) {
    console.log(`  ${label}: seed did not correct`);
    return;
  }
  const start = memberFrom(context, seed, 0);
  const run = timed(() => continueFamily(context, start, rules, corrector));
  const members = run.value.members.length - 1; // the seed was corrected before the clock started
  console.log(`  ${label}: ${members} members in ${(run.ms / 1000).toFixed(2)} s = ${((members * 1000) / run.ms).toFixed(1)} members/s`
    + ` (ends: ${run.value.endReasonStart}, ${run.value.endReasonEnd})`);
}

export async function run(): Promise<void> {
  // 1. Seed search.
  const seeds = seedSearch();

  // 2. Correction of one member. The E1M1 family seeded from the far side of the Earth closes at its first
  //    crossing of y = 0 (x₀ ≈ −0.77 at C = 3.05); start from the scan's root, nudged off it by 1e-4 in ẏ₀.
  const e1m1 = seeds.find((s) => s.halfCrossings === 1 && s.vy0 < 0 && s.x0 < -0.7 && s.x0 > -0.8) ?? null;
  console.log('correction of one member:');
  if (e1m1) {
    const fixed = repeat(10, () => correctAtFixedX0(MU, 1, e1m1.x0, e1m1.vy0 * (1 + 1e-4), corrector));
    const corrected = correctAtFixedX0(MU, 1, e1m1.x0, e1m1.vy0 * (1 + 1e-4), corrector)!;
    console.log(`  E1M1 seed, Newton on ẏ₀ (${corrected.iterations} shots): ${stats(fixed)}`);
    const member = memberFrom(context, corrected, 0);
    const arc = repeat(10, () => correctOnArc(MU, 1, [member.x0, member.vy0], member.tangent, 1e-3, corrector));
    console.log(`  E1M1, one pseudo-arclength step of 1e-3: ${stats(arc)}`);
    const analysis = repeat(10, () => analyseOrbit(context, member.x0, member.vy0, 2 * member.tHalfNd));
    console.log(`  E1M1, full-period analysis (6×6 STM, events): ${stats(analysis)}`);
  } else {
    console.log(`  no E1M1 root near x₀ = −0.77 among the ${seeds.length} seeds; skipped`);
  }
  const [lx0, lvy0] = lyapunovGuess(MU, X_L1, 0.01);
  const lyapunovFixed = repeat(20, () => correctAtFixedX0(MU, 1, lx0, lvy0, corrector));
  console.log(`  L1 Lyapunov (amplitude 0.01) from Richardson's linear guess: ${stats(lyapunovFixed)}`);

  // 3. Continuation of one family.
  console.log('continuation of one family (members per second):');
  continuation('L1 Lyapunov, 100 members', 1, lx0, lvy0, rulesFor(101, null, false));
  if (e1m1) continuation('E1M1 cycler, up to 120 members', 1, e1m1.x0, e1m1.vy0, rulesFor(121, { primaryLaps: 1, secondaryLaps: 1 }, true));
}
