// Which catalogued family an orbit lies on, for the orbit past a change of lap signature. Either a family
// holds it between two members (lies-on-family.ts), or a member sits where it is: two families that meet
// at one signature boundary each end within a few closing-in steps of it (continue-family.ts), so the
// orbit past one end lies beyond the other family's last member, not between two of its members.
import { asFamilyMembers, type StoredFootprint } from './audit-footprint.ts';
import { liesOnFamily, type OrbitFootprint } from './lies-on-family.ts';

export interface FamilyFootprints {
  id: string;
  members: readonly StoredFootprint[];
}

/** Reach of the closing-in steps at a boundary, with room: C, crossing positions (nondimensional). */
const NEAR_JACOBI = 1e-5;
const NEAR_POSITION_ND = 1e-4;

function sameOrbitNearby(orbit: OrbitFootprint, member: OrbitFootprint): boolean {
  const near = (a: number, b: number) => Math.abs(a - b) < NEAR_POSITION_ND;
  const samePoints = (near(orbit.x0, member.x0) && near(orbit.xHalf, member.xHalf))
    || (near(orbit.x0, member.xHalf) && near(orbit.xHalf, member.x0));
  return samePoints && Math.abs(orbit.jacobi - member.jacobi) < NEAR_JACOBI
    && Math.abs(orbit.periodNd - member.periodNd) < NEAR_POSITION_ND * Math.max(1, member.periodNd);
}

/** Id of the first family holding the orbit, or null. */
export function familyHolding(orbit: OrbitFootprint, families: readonly FamilyFootprints[]): string | null {
  for (const family of families) {
    if (liesOnFamily(orbit, asFamilyMembers(family.members))) return family.id;
    if (family.members.some((member) => sameOrbitNearby(orbit, member))) return family.id;
  }
  return null;
}
