// The invariant-curve criterion and hold-radius search on Hénon's area-preserving quadratic map (Hénon 1969,
// Q. Appl. Math. 27). For cos α = 0.24, a case Hénon plotted (from memory: closed curves around the origin,
// a chain of five islands further out, escape beyond), the detected radius must be positive, points well
// inside must stay on invariant curves and points well outside must escape. "Escape" and "stays" are
// decided here by brute force (10⁵ iterates), independently of the criterion.
import { describe, expect, it } from 'vitest';
import { circleOrderViolations, InvariantCurveJudge, normalFrame, weightedBirkhoffAverage } from '../../generator/core/beyond/index.ts';
import { henonStep } from './helpers/henon-map.ts';
import { henonHoldRadius, henonTrial } from './helpers/henon-hold-radius.ts';

const COS_ALPHA = 0.24;
const SIN_ALPHA = Math.sqrt(1 - COS_ALPHA * COS_ALPHA);

/** Iterates until |x| + |y| > 10 (an escape: the map is then dominated by x² and runs off); -1 if it never does. */
function escapeIterate(d: number, iterates: number): number {
  const p = Float64Array.of(d, 0);
  for (let i = 0; i < iterates; i++) {
    henonStep(COS_ALPHA, SIN_ALPHA, p);
    if (Math.abs(p[0]) + Math.abs(p[1]) > 10) return i;
  }
  return -1;
}

/** Smallest and largest distance from the origin over n iterates, relative to the start's. */
function radiusRange(d: number, n: number): [number, number] {
  const p = Float64Array.of(d, 0);
  let lo = 1, hi = 1;
  for (let i = 0; i < n; i++) {
    henonStep(COS_ALPHA, SIN_ALPHA, p);
    const r = Math.hypot(p[0], p[1]) / d;
    lo = Math.min(lo, r);
    hi = Math.max(hi, r);
  }
  return [lo, hi];
}

describe('Hénon map, cos α = 0.24', () => {
  const result = henonHoldRadius(COS_ALPHA);

  it('has a positive hold radius, below the brute-force escape boundary', () => {
    expect(result.radiusNd).toBeGreaterThan(0.2);
    expect(result.failingNd).toBeGreaterThan(result.radiusNd);
    // The smallest d on a grid of 0.01 whose orbit escapes within 1e5 iterates bounds the region from outside.
    let firstEscape = Infinity;
    for (let d = 0.01; d < 1.5 && !Number.isFinite(firstEscape); d += 0.01) if (escapeIterate(d, 100000) >= 0) firstEscape = d;
    expect(firstEscape).toBeLessThan(1.5);
    expect(result.radiusNd).toBeLessThan(firstEscape);
  });

  it('keeps points well inside on invariant curves: bounded for 1e5 iterates and in circle order for 2000', () => {
    for (const fraction of [0.1, 0.5, 0.9]) {
      const d = fraction * result.radiusNd;
      expect(escapeIterate(d, 100000)).toBe(-1);
      const [lo, hi] = radiusRange(d, 100000);
      expect(lo).toBeGreaterThan(0.5);
      expect(hi).toBeLessThan(2);
      const long = henonTrial(COS_ALPHA, d, 2000, new InvariantCurveJudge(2000));
      expect(long.verdict.holds, `d = ${d}`).toBe(true);
      expect(long.verdict.orderViolations).toBe(0);
    }
  });

  it('turns points near the origin by α per iterate (linear theory: the rotation by α)', () => {
    const small = henonTrial(COS_ALPHA, 1e-3, 200, new InvariantCurveJudge(200));
    expect(small.verdict.rotationRad).toBeCloseTo(Math.acos(COS_ALPHA), 5);
  });

  it('sees points well outside escape, and fails them', () => {
    for (const factor of [2, 3]) {
      const d = factor * result.radiusNd;
      const escape = escapeIterate(d, 100000);
      expect(escape, `d = ${d}`).toBeGreaterThanOrEqual(0);
      expect(escape).toBeLessThan(1000);
      expect(henonTrial(COS_ALPHA, d, 200, new InvariantCurveJudge(200)).verdict.holds).toBe(false);
    }
  });

  it('never calls an escaping orbit a curve: every d on a grid that escapes within 1e5 iterates fails 2000-iterate trials', () => {
    // Includes sticky orbits that survive thousands of iterates before leaving (they show as order violations).
    let escaping = 0;
    for (let d = 0.3; d < 1.2; d += 0.01) {
      if (escapeIterate(d, 100000) < 0) continue;
      escaping++;
      expect(henonTrial(COS_ALPHA, d, 2000, new InvariantCurveJudge(2000)).verdict.holds, `d = ${d}`).toBe(false);
    }
    expect(escaping).toBeGreaterThan(10);
  });

  it('finds beyond the radius the chain of five islands (turn 2π/5 per iterate, not in circle order about the origin)', () => {
    const d = result.failingNd + 0.03;
    expect(escapeIterate(d, 100000)).toBe(-1); // regular, bounded …
    const trial = henonTrial(COS_ALPHA, d, 2000, new InvariantCurveJudge(2000));
    expect(trial.verdict.rotationRad).toBeCloseTo((2 * Math.PI) / 5, 3); // … on the 1:5 island chain
    expect(trial.verdict.orderViolations).toBeGreaterThan(0); // … which does not circle the origin
  });

  it('bisects to the bracket asked', () => {
    const bisected = henonHoldRadius(COS_ALPHA, { search: { bisections: 12 } });
    expect(bisected.failingNd - bisected.radiusNd).toBeLessThanOrEqual(bisected.radiusNd / 2 ** 11);
    const trialOf = (d: number) => bisected.trials.find((t) => t.displacementNd === d)!;
    expect(trialOf(bisected.radiusNd).holds).toBe(true);
    expect(trialOf(bisected.failingNd).holds).toBe(false);
  });
});

describe('pieces of the criterion', () => {
  it('circle order: a rigid rotation has no violations, shuffled angles have many (Poincaré, circle homeomorphisms)', () => {
    const n = 300;
    const rotation = Array.from({ length: n }, (_, i) => ((i * 2.39996) % (2 * Math.PI)) - Math.PI);
    expect(circleOrderViolations(rotation)).toBe(0);
    // A monotone reparametrisation of the circle keeps the order (the criterion does not need uniform motion).
    expect(circleOrderViolations(rotation.map((a) => a + 0.3 * Math.sin(a)))).toBe(0);
    let seed = 7;
    const random = () => ((seed = (seed * 16807) % 2147483647) / 2147483647) * 2 * Math.PI - Math.PI;
    expect(circleOrderViolations(Array.from({ length: n }, random))).toBeGreaterThan(n / 2);
  });

  it('weighted Birkhoff average: converges super-polynomially on a quasi-periodic signal (Das et al. 2017)', () => {
    const omega = (Math.sqrt(5) - 1) * Math.PI; // golden rotation
    const values = Array.from({ length: 400 }, (_, i) => 1 + Math.cos(i * omega) + 0.5 * Math.sin(2 * i * omega));
    expect(Math.abs(weightedBirkhoffAverage(values, 0, 400) - 1)).toBeLessThan(1e-10);
    // The plain average of the same values is only ~1/N accurate.
    const plain = values.reduce((a, b) => a + b, 0) / values.length;
    expect(Math.abs(plain - 1)).toBeGreaterThan(1e-5);
  });

  it('normal frame: turns the linear map into a rotation by the angle whose cosine is half the trace', () => {
    // A symplectic 2×2 map (det 1) with trace 0.6: M = A R(μ) A⁻¹ with a sheared, scaled A.
    const mu = Math.acos(0.3);
    const A = [[2, 0.5], [0, 0.5]];
    const Ainv = [[0.5, -0.5], [0, 2]];
    const R = [[Math.cos(mu), -Math.sin(mu)], [Math.sin(mu), Math.cos(mu)]];
    const mul = (P: number[][], Q: number[][]) => P.map((row) => [0, 1].map((j) => row[0] * Q[0][j] + row[1] * Q[1][j]));
    const M = mul(mul(A, R), Ainv);
    const frame = normalFrame(M[0][0], M[0][1], M[1][0], M[1][1]);
    expect(frame.elliptic).toBe(true);
    expect(Math.abs(frame.linearAngleRad)).toBeCloseTo(mu, 12);
    // In the frame, M preserves distance from the fixed point.
    for (const [u, v] of [[1, 0], [0.3, -2], [-1, 1]]) {
      const X = frame.m00 * u + frame.m01 * v, Y = frame.m10 * u + frame.m11 * v;
      const mu2 = M[0][0] * u + M[0][1] * v, mv2 = M[1][0] * u + M[1][1] * v;
      const X2 = frame.m00 * mu2 + frame.m01 * mv2, Y2 = frame.m10 * mu2 + frame.m11 * mv2;
      expect(Math.hypot(X2, Y2)).toBeCloseTo(Math.hypot(X, Y), 12);
    }
    expect(normalFrame(3, 1, 2, 1).elliptic).toBe(false); // trace 4: hyperbolic
  });
});
