// Whether a seed is an orbit of an already continued family: some pair of neighbouring members brackets
// its C and, interpolated there, has the same two perpendicular crossings (either start) and period.
import type { FamilyMember } from './family-member.ts';

export interface OrbitFootprint {
  jacobi: number;
  x0: number;
  xHalf: number;
  periodNd: number;
}

export function footprintOf(member: FamilyMember): OrbitFootprint {
  return { jacobi: member.analysis.jacobi, x0: member.x0, xHalf: member.xHalf, periodNd: member.analysis.periodNd };
}

export function liesOnFamily(seed: OrbitFootprint, members: readonly FamilyMember[], tolerance = 1e-4): boolean {
  for (let i = 0; i + 1 < members.length; i++) {
    const a = members[i], b = members[i + 1];
    const ca = a.analysis.jacobi, cb = b.analysis.jacobi;
    const lo = Math.min(ca, cb) - 1e-9, hi = Math.max(ca, cb) + 1e-9;
    if (seed.jacobi < lo || seed.jacobi > hi) continue;
    const f = cb === ca ? 0 : (seed.jacobi - ca) / (cb - ca);
    const at = (p: number, q: number) => p + f * (q - p);
    const x0 = at(a.x0, b.x0), xHalf = at(a.xHalf, b.xHalf), period = at(a.analysis.periodNd, b.analysis.periodNd);
    const samePoints = (Math.abs(seed.x0 - x0) < tolerance && Math.abs(seed.xHalf - xHalf) < tolerance)
      || (Math.abs(seed.x0 - xHalf) < tolerance && Math.abs(seed.xHalf - x0) < tolerance);
    if (samePoints && Math.abs(seed.periodNd - period) < tolerance * Math.max(1, period) * 10) return true;
  }
  return false;
}
