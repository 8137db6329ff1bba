// Hénon's area-preserving quadratic map (Hénon 1969, "Numerical study of quadratic area-preserving
// mappings", Q. Appl. Math. 27):  x' = x cos α − (y − x²) sin α,  y' = x sin α + (y − x²) cos α.
// The origin is an elliptic fixed point whose linearisation is the rotation by α (normal frame: identity);
// a test bed for the invariant-curve machinery with no integrator in the way.

/** Applies the map once to p = [x, y] in place. */
export function henonStep(cosAlpha: number, sinAlpha: number, p: Float64Array): void {
  const x = p[0];
  const w = p[1] - x * x;
  p[0] = x * cosAlpha - w * sinAlpha;
  p[1] = x * sinAlpha + w * cosAlpha;
}
