// Coordinates in which the linearisation of an area-preserving map at an elliptic fixed point is a rotation:
// for M = [[a, b], [c, d]] with det M = 1 and |tr M| < 2 write M = I cos μ + [[α, β], [−γ, −α]] sin μ
// (βγ − α² = 1, β > 0; the Courant–Snyder parametrisation, Courant & Snyder 1958, Ann. Phys. 3); then
// X = u/√β, Y = (α u + β v)/√β turns M into a rotation by μ. Invariant curves near the fixed point are
// ellipses in (u, v) and nearly circles in (X, Y), so radius and angle there are the natural measures.
// For a hyperbolic or parabolic fixed point (|tr M| ≥ 2) there is no such frame: the identity is used.

export interface NormalFrame {
  /** X = m00 u + m01 v, Y = m10 u + m11 v. */
  m00: number;
  m01: number;
  m10: number;
  m11: number;
  /** Angle (rad, in (−π, π]) by which the linear map turns a point about the fixed point, in these coordinates. */
  linearAngleRad: number;
  elliptic: boolean;
}

export function normalFrame(a: number, b: number, c: number, d: number): NormalFrame {
  for (const [name, v] of [['a', a], ['b', b], ['c', c], ['d', d]] as const) {
    if (!Number.isFinite(v)) throw new RangeError(`linear map entry ${name} must be finite, got ${v}`);
  }
  const cosMu = (a + d) / 2;
  let frame: Omit<NormalFrame, 'linearAngleRad'>;
  if (Math.abs(cosMu) < 1 && b !== 0) {
    const sinMu = Math.sign(b) * Math.sqrt(1 - cosMu * cosMu);
    const beta = b / sinMu;
    const alpha = (a - d) / (2 * sinMu);
    const root = Math.sqrt(beta);
    frame = { m00: 1 / root, m01: 0, m10: alpha / root, m11: root, elliptic: true };
  } else {
    frame = { m00: 1, m01: 0, m10: 0, m11: 1, elliptic: false };
  }
  // Image of the first frame axis under the linear map, seen in the frame: its angle is the linear turn.
  const u = frame.m11, v = -frame.m10; // (u, v) maps to X = det, Y = 0: the preimage of (1, 0) up to scale
  const mu = a * u + b * v, mv = c * u + d * v;
  const X = frame.m00 * mu + frame.m01 * mv, Y = frame.m10 * mu + frame.m11 * mv;
  return { ...frame, linearAngleRad: Math.atan2(Y, X) };
}
