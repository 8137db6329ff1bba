// Period of the planar oscillation of the linearised flow about a collinear point
// (Richardson 1980, Celest. Mech. 22): ω² = (2 − c₂ + √(9c₂² − 8c₂)) / 2,
// c₂ = (1 − μ)/|x + μ|³ + μ/|x − 1 + μ|³. Nondimensional.
export function linearPlanarPeriod(mu: number, xCollinear: number): number {
  const c2 = (1 - mu) / Math.abs(xCollinear + mu) ** 3 + mu / Math.abs(xCollinear - 1 + mu) ** 3;
  const omegaSq = (2 - c2 + Math.sqrt(9 * c2 * c2 - 8 * c2)) / 2;
  return (2 * Math.PI) / Math.sqrt(omegaSq);
}
