// Synodic lock (our vocabulary): the small-integer ratio p:q nearest to period / synodic period.

export interface SynodicLock {
  p: number;
  q: number;
  /** (period/synodic − p/q) / (p/q). */
  relativeError: number;
}

/** The p/q nearest to the ratio with 1 ≤ q ≤ maxDenominator (ties go to the smaller q). */
export function synodicLock(periodDays: number, synodicPeriodDays: number, maxDenominator = 12): SynodicLock {
  if (!(periodDays > 0) || !(synodicPeriodDays > 0)) {
    throw new RangeError(`periods must be positive (period ${periodDays} d, synodic ${synodicPeriodDays} d)`);
  }
  const ratio = periodDays / synodicPeriodDays;
  let best: SynodicLock | null = null;
  for (let q = 1; q <= maxDenominator; q++) {
    const p = Math.max(1, Math.round(ratio * q));
    const relativeError = (ratio - p / q) / (p / q);
    if (!best || Math.abs(ratio - p / q) < Math.abs(ratio - best.p / best.q) - 1e-15) best = { p, q, relativeError };
  }
  const g = gcd(best!.p, best!.q);
  return { p: best!.p / g, q: best!.q / g, relativeError: best!.relativeError };
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}
