// Vertically critical members of a family (ν_z = ±1): where families of spatial (3D) orbits branch off the
// planar one. Each bifurcation row with plane 'vertical' is listed with the member stored at it (the
// generator stores the located member and gives the row its arclength) or, when none sits exactly there,
// the members on either side along the family (by continuation arclength).
import type { BifurcationRow, OrbitRow } from '../../catalog-db/types.ts';
import { membersBeside } from './members-beside.ts';
import { orbitHref } from './page-links.ts';

export interface MemberLink {
  id: string;
  seq: number;
  href: string;
}

export interface BranchPoint {
  bifurcation: BifurcationRow;
  /** ν_z at the crossing: +1 (tangent) or −1 (period doubling). */
  verticalIndex: 1 | -1;
  /** The member stored at the bifurcation's arclength, if any. */
  member: MemberLink | null;
  before: MemberLink | null;
  after: MemberLink | null;
}

const link = (o: OrbitRow | undefined): MemberLink | null => (o ? { id: o.id, seq: o.seq, href: orbitHref(o.id) } : null);

export function branchPoints(bifurcations: BifurcationRow[], members: OrbitRow[]): BranchPoint[] {
  return bifurcations
    .filter((b) => b.plane === 'vertical')
    .map((b) => {
      const at = members.find((o) => o.arclength === b.arclength);
      const { before, after } = membersBeside(members, b.arclength);
      return {
        bifurcation: b, verticalIndex: b.kind === 'tangent' ? 1 : -1, member: link(at),
        before: at ? null : link(before), after: at ? null : link(after),
      };
    });
}
