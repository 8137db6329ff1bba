// Where along a family a stability index crosses +1 or −1: Brent's method on the fraction σ of the secant
// between two neighbouring members, re-correcting the orbit on the hyperplane through the secant point.
import { findRootBrent } from '../events/find-root-brent.ts';
import type { AnalysisContext } from './analyse-orbit.ts';
import { correctOnArc, type CorrectorOptions } from './correct-on-arc.ts';
import { memberFrom } from './continue-family.ts';
import type { FamilyMember } from './family-member.ts';

export type IndexKind = 'in-plane' | 'vertical';

export function indexOf(member: FamilyMember, kind: IndexKind): number {
  return kind === 'in-plane' ? member.analysis.stabilityIndex : member.analysis.verticalStabilityIndex;
}

/** The member between a and b where the index equals target (±1) to `indexTolerance`, or null if it cannot be corrected. */
/** Corrected on the hyperplane at `distance` along the secant from a, at a's crossing count, else b's. */
function correctOnSecant(
  context: AnalysisContext, a: FamilyMember, b: FamilyMember, direction: [number, number], distance: number, options: CorrectorOptions,
) {
  return correctOnArc(context.mu, a.halfCrossings, [a.x0, a.vy0], direction, distance, options)
    ?? (b.halfCrossings !== a.halfCrossings ? correctOnArc(context.mu, b.halfCrossings, [a.x0, a.vy0], direction, distance, options) : null);
}

/** Neighbours that are one orbit stated from its two crossings (a family's switch of start crossing). */
export function oneOrbit(a: FamilyMember, b: FamilyMember): boolean {
  return Math.abs(a.analysis.jacobi - b.analysis.jacobi) < 1e-12 && Math.abs(a.analysis.periodNd - b.analysis.periodNd) < 1e-9 * a.analysis.periodNd;
}

export function locateIndexCrossing(
  context: AnalysisContext, a: FamilyMember, b: FamilyMember, kind: IndexKind, target: 1 | -1,
  indexTolerance: number, corrector: CorrectorOptions,
): FamilyMember | null {
  const chord = Math.hypot(b.x0 - a.x0, b.vy0 - a.vy0);
  const direction: [number, number] = [(b.x0 - a.x0) / chord, (b.vy0 - a.vy0) / chord];
  const options = { ...corrector, maxTimeNd: 3 * Math.max(a.tHalfNd, b.tHalfNd) };
  let last: FamilyMember | null = null;
  const memberAt = (sigma: number): FamilyMember | null => {
    const corrected = correctOnSecant(context, a, b, direction, sigma * chord, options);
    if (!corrected) return null;
    const arclength = a.arclength + sigma * (b.arclength - a.arclength);
    return memberFrom(context, corrected, arclength, a.tangent);
  };
  const f = (sigma: number): number => {
    const m = memberAt(sigma);
    if (!m) throw new Error('correction failed');
    last = m;
    return indexOf(m, kind) - target;
  };
  try {
    const fa = indexOf(a, kind) - target;
    const fb = indexOf(b, kind) - target;
    // Stops once the index is within a tenth of the tolerance; σ to round-off otherwise.
    const sigma = findRootBrent(f, 0, 1, fa, fb, 1e-15, indexTolerance / 10);
    const found = last && (last as FamilyMember).arclength === a.arclength + sigma * (b.arclength - a.arclength) ? last as FamilyMember : memberAt(sigma);
    if (!found) return null;
    if (Math.abs(indexOf(found, kind) - target) > indexTolerance) return null;
    return found;
  } catch {
    return null;
  }
}

/** The member at fraction σ of the way from a to b (for a window's middle orbit). */
export function memberBetween(
  context: AnalysisContext, a: FamilyMember, b: FamilyMember, sigma: number, corrector: CorrectorOptions,
): FamilyMember | null {
  if (oneOrbit(a, b)) return a; // nothing lies between one orbit and itself
  const chord = Math.hypot(b.x0 - a.x0, b.vy0 - a.vy0);
  const direction: [number, number] = [(b.x0 - a.x0) / chord, (b.vy0 - a.vy0) / chord];
  const options = { ...corrector, maxTimeNd: 3 * Math.max(a.tHalfNd, b.tHalfNd) };
  const corrected = correctOnSecant(context, a, b, direction, sigma * chord, options);
  if (!corrected) return null;
  try {
    return memberFrom(context, corrected, a.arclength + sigma * (b.arclength - a.arclength), a.tangent);
  } catch {
    return null;
  }
}
