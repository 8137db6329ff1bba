// Brent's method for a bracketed root (Brent 1973, Algorithms for Minimization without Derivatives, ch. 4).

/**
 * Root of f in [a, b] where f(a) and f(b) differ in sign (or one is zero), to |Δx| ≤ tol,
 * or sooner where |f| ≤ fTolerance.
 */
export function findRootBrent(
  f: (x: number) => number, a: number, b: number, fa: number, fb: number, tol: number, fTolerance = 0,
): number {
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (fa * fb > 0) throw new RangeError(`root not bracketed: f(${a}) = ${fa}, f(${b}) = ${fb}`);
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 0; iteration < 200; iteration++) {
    if (fb * fc > 0) {
      c = a; fc = fa; d = b - a; e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b; b = c; c = a;
      fa = fb; fb = fc; fc = fa;
    }
    const tol1 = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tol;
    const half = 0.5 * (c - b);
    if (Math.abs(half) <= tol1 || Math.abs(fb) <= fTolerance) return b;
    if (Math.abs(e) >= tol1 && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * half * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * half * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * half * q - Math.abs(tol1 * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = half; e = d;
      }
    } else {
      d = half; e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol1 ? d : half > 0 ? tol1 : -tol1;
    fb = f(b);
  }
  return b;
}
