// Whether an orbit the audit found lies on a catalogued family. First the generator's own test
// (lies-on-family.ts: interpolation between neighbouring members at the orbit's C, at either of its
// perpendicular crossings). Linear interpolation between members a continuation step apart can miss a
// bend or a fold of the family curve, so a near miss is tried again on the stretch between the two
// members it falls between, sampled finer by correcting orbits on the secant's normal planes
// (pseudo-arclength corrector, Keller 1977): an orbit of the family then lies between close members.
import { jacobiConstant } from '../cr3bp/jacobi-constant.ts';
import { asFamilyMembers, type StoredFootprint } from './audit-footprint.ts';
import type { AuditContext, AuditOrbit } from './audit-scan.ts';
import { correctOnArc } from './correct-on-arc.ts';
import { liesOnFamily, type OrbitFootprint } from './lies-on-family.ts';

/** Finer samples per stretch: interpolation error falls with the square of the spacing. */
const REFINE_SAMPLES = 8;
/** An interpolated crossing this close (nondimensional) is a near miss worth refining. */
const NEAR_MISS_ND = 2e-2;

function nearStretch(orbit: OrbitFootprint, a: StoredFootprint, b: StoredFootprint): boolean {
  // A fold of C between the two members can reach beyond both: widen the bracket by their own C span.
  const span = Math.abs(a.jacobi - b.jacobi);
  if (orbit.jacobi < Math.min(a.jacobi, b.jacobi) - span - 1e-9 || orbit.jacobi > Math.max(a.jacobi, b.jacobi) + span + 1e-9) return false;
  const near = (p: number, q: number, r: number) => Math.abs(p - q) < NEAR_MISS_ND || Math.abs(p - r) < NEAR_MISS_ND;
  const x0Near = near(orbit.x0, a.x0, b.x0) && near(orbit.xHalf, a.xHalf, b.xHalf);
  const swappedNear = near(orbit.x0, a.xHalf, b.xHalf) && near(orbit.xHalf, a.x0, b.x0);
  return x0Near || swappedNear;
}

/** The stretch from a to b with REFINE_SAMPLES − 1 corrected orbits between them (failed ones left out). */
function refinedStretch(context: AuditContext, halfCrossings: number, a: StoredFootprint, b: StoredFootprint): OrbitFootprint[] {
  const mu = context.job.system.mu;
  const dx = b.x0 - a.x0, dv = b.vy0 - a.vy0;
  const length = Math.hypot(dx, dv);
  if (!(length > 0)) return [a, b];
  const tangent: [number, number] = [dx / length, dv / length];
  const stretch: OrbitFootprint[] = [a];
  for (let i = 1; i < REFINE_SAMPLES; i++) {
    let corrected;
    try {
      corrected = correctOnArc(mu, halfCrossings, [a.x0, a.vy0], tangent, (i * length) / REFINE_SAMPLES, context.corrector);
    } catch {
      continue; // a trial orbit into a body: no sample there
    }
    if (!corrected) continue;
    stretch.push({
      x0: corrected.x0, xHalf: corrected.shot.state[0], periodNd: 2 * corrected.shot.tHalfNd,
      jacobi: jacobiConstant(mu, [corrected.x0, 0, 0, corrected.vy0], true),
    });
  }
  stretch.push(b);
  return stretch;
}

export function liesOnCatalogFamily(context: AuditContext, orbit: AuditOrbit, families: readonly (readonly StoredFootprint[])[]): boolean {
  if (families.some((members) => liesOnFamily(orbit, asFamilyMembers(members)))) return true;
  for (const members of families) {
    for (let i = 0; i + 1 < members.length; i++) {
      if (!nearStretch(orbit, members[i], members[i + 1])) continue;
      if (liesOnFamily(orbit, asFamilyMembers(refinedStretch(context, orbit.halfCrossings, members[i], members[i + 1])))) return true;
    }
  }
  return false;
}
