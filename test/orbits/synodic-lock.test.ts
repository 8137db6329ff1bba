// Synodic lock (DESIGN.md, our vocabulary): the small-integer ratio p:q nearest to period / synodic month, with
// its relative error. "Nearest" is checked against two outside references: a brute-force search over every
// p/q with q ≤ 12, and the best rational approximation with bounded denominator from continued fractions (a best
// approximation is a convergent or an intermediate fraction: Khinchin 1964, Continued Fractions, §6, Thms 15–16).
// Synodic month 29.530589 d: astronomical almanacs (DESIGN.md, from memory).
import { describe, expect, it } from 'vitest';
import { synodicLock } from '../../generator/core/orbits/synodic-lock.ts';

const SYNODIC_DAYS = 29.530589;

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));

/** Every reduced p/q with p ≥ 1, 1 ≤ q ≤ maxQ; the nearest to x (ties to the smaller q). */
function bruteForceNearest(x: number, maxQ: number): { p: number; q: number } {
  let best = { p: 1, q: 1, distance: Infinity };
  for (let q = 1; q <= maxQ; q++) {
    for (let p = 1; p <= Math.ceil(x * q) + 1; p++) {
      if (gcd(p, q) !== 1) continue;
      const distance = Math.abs(x - p / q);
      if (distance < best.distance - 1e-15) best = { p, q, distance };
    }
  }
  return { p: best.p, q: best.q };
}

/** Best rational approximation of x > 0 with denominator ≤ maxQ from its continued fraction (Khinchin 1964). */
function continuedFractionNearest(x: number, maxQ: number): { p: number; q: number } {
  let [p0, q0, p1, q1] = [0, 1, 1, 0]; // convergents p₋₂/q₋₂ = 0/1, p₋₁/q₋₁ = 1/0
  let rest = x;
  for (;;) {
    const a = Math.floor(rest);
    const q2 = q0 + a * q1;
    if (q2 > maxQ) break;
    [p0, q0, p1, q1] = [p1, q1, p0 + a * p1, q2];
    if (rest === a) return { p: p1, q: q1 };
    rest = 1 / (rest - a);
  }
  // The last convergent p₁/q₁ or the largest intermediate fraction (p₀ + k p₁)/(q₀ + k q₁) that fits.
  const k = Math.floor((maxQ - q0) / q1);
  const inter = { p: p0 + k * p1, q: q0 + k * q1 };
  return Math.abs(x - inter.p / inter.q) < Math.abs(x - p1 / q1) ? inter : { p: p1, q: q1 };
}

describe('synodicLock', () => {
  it('locks a period of two synodic months at 2:1 exactly', () => {
    const lock = synodicLock(59.061178, SYNODIC_DAYS);
    expect([lock.p, lock.q]).toEqual([2, 1]);
    expect(Math.abs(lock.relativeError)).toBeLessThan(1e-12);
  });

  it('locks 3/2 and 5/7 of a synodic month at 3:2 and 5:7 (reduced, not 6:4)', () => {
    expect(synodicLock((SYNODIC_DAYS * 3) / 2, SYNODIC_DAYS)).toMatchObject({ p: 3, q: 2 });
    expect(synodicLock((SYNODIC_DAYS * 6) / 4, SYNODIC_DAYS)).toMatchObject({ p: 3, q: 2 });
    expect(synodicLock((SYNODIC_DAYS * 5) / 7, SYNODIC_DAYS)).toMatchObject({ p: 5, q: 7 });
  });

  it('reports the relative error (period/synodic − p/q)/(p/q) with its sign', () => {
    const lock = synodicLock(SYNODIC_DAYS * 2 * 1.001, SYNODIC_DAYS);
    expect([lock.p, lock.q]).toEqual([2, 1]);
    expect(lock.relativeError).toBeCloseTo(0.001, 12);
    expect(synodicLock(SYNODIC_DAYS * 0.999, SYNODIC_DAYS).relativeError).toBeCloseTo(-0.001, 12);
  });

  it('gives the continued-fraction best approximant for irrational-ish ratios (π → 22/7, e → 19/7, φ → 13/8, √2 → 17/12)', () => {
    const cases: Array<[number, number, number]> = [
      [Math.PI, 22, 7], // π = [3; 7, 15, …]: convergent 22/7
      [Math.E, 19, 7], // e = [2; 1, 2, 1, 1, 4, …]: convergent 19/7
      [(1 + Math.sqrt(5)) / 2, 13, 8], // φ = [1; 1, 1, …]: Fibonacci ratio 13/8
      [Math.SQRT2, 17, 12], // √2 = [1; 2, 2, …]: convergent 17/12
    ];
    for (const [ratio, p, q] of cases) {
      expect(continuedFractionNearest(ratio, 12)).toEqual({ p, q });
      expect(bruteForceNearest(ratio, 12)).toEqual({ p, q });
      expect(synodicLock(ratio * SYNODIC_DAYS, SYNODIC_DAYS), `ratio ${ratio}`).toMatchObject({ p, q });
    }
  });

  it('respects maxDenominator (π with q ≤ 6 → 19/6, q = 1 → 3)', () => {
    expect(continuedFractionNearest(Math.PI, 6)).toEqual({ p: 19, q: 6 });
    expect(synodicLock(Math.PI * SYNODIC_DAYS, SYNODIC_DAYS, 6)).toMatchObject({ p: 19, q: 6 });
    expect(synodicLock(Math.PI * SYNODIC_DAYS, SYNODIC_DAYS, 1)).toMatchObject({ p: 3, q: 1 });
  });

  it('agrees with the brute-force and continued-fraction nearest ratio over a sweep of period ratios 0.3 … 4', () => {
    const mismatches: string[] = [];
    for (let i = 0; i <= 4000; i++) {
      const ratio = 0.3 + (3.7 * i) / 4000;
      const lock = synodicLock(ratio * SYNODIC_DAYS, SYNODIC_DAYS);
      const brute = bruteForceNearest(ratio, 12);
      // The two references agree with each other everywhere (Khinchin 1964) ...
      expect(continuedFractionNearest(ratio, 12), `continued fraction vs brute force at ${ratio}`).toEqual(brute);
      // ... and synodicLock must pick the same nearest ratio.
      if (lock.p !== brute.p || lock.q !== brute.q) {
        mismatches.push(`ratio ${ratio}: ${lock.p}/${lock.q} (|Δ| ${Math.abs(ratio - lock.p / lock.q).toExponential(3)}) but ${brute.p}/${brute.q} is nearer (|Δ| ${Math.abs(ratio - brute.p / brute.q).toExponential(3)})`);
      }
    }
    expect(mismatches.slice(0, 5), `${mismatches.length} of 4001 ratios`).toEqual([]);
  });

  it('rejects non-positive periods with a message naming them', () => {
    expect(() => synodicLock(0, SYNODIC_DAYS)).toThrow(/period/);
    expect(() => synodicLock(30, -1)).toThrow(/synodic/);
    expect(() => synodicLock(Number.NaN, SYNODIC_DAYS)).toThrow(RangeError);
  });
});
