// Which members of a family get a page of their own. A complete atlas holds families of thousands of
// members (continuation steps short enough that no stable window is stepped over), far more than anyone
// reads one by one or a static build can render in minutes; every member stays in the charts, the
// downloadable catalog and its exports. Pages go to the members an analyst asks for: the family's ends,
// an even spread along it, each run of stable members (first, middle, last), each window's middle
// member, every screened member and the members on either side of each vertical bifurcation.
import type { BifurcationRow, OrbitRow, StableWindowRow } from '../../catalog-db/types.ts';
import { membersBeside } from './members-beside.ts';
import { spreadIndices } from './spread-indices.ts';

/** Families up to this many members get a page for every member. */
export const PAGE_EVERY_MEMBER_UP_TO = 64;

/** Members spread evenly along a longer family that get a page besides the stable and screened ones. */
export const SPREAD_PAGES_PER_FAMILY = 24;

/** The rule above in words, for the pages that list paged members only. */
export const PAGED_MEMBERS_RULE = `every member of a family of up to ${PAGE_EVERY_MEMBER_UP_TO}; of a longer family its ends, `
  + `${SPREAD_PAGES_PER_FAMILY} members spread along it, the first, middle and last member of each run of stable members, `
  + 'every screened member and the members beside each vertical bifurcation';

export interface PagedMemberInputs {
  /** The family's members in seq order. */
  members: readonly OrbitRow[];
  windows: readonly StableWindowRow[];
  bifurcations: readonly BifurcationRow[];
  screenedOrbitIds: ReadonlySet<string>;
}

/** Indices of the first, middle and last member of each run of consecutive in-plane stable members. */
function stableRunIndices(members: readonly OrbitRow[]): number[] {
  const picked: number[] = [];
  let runStart = -1;
  for (let i = 0; i <= members.length; i++) {
    const stable = i < members.length && members[i].stable;
    if (stable && runStart < 0) runStart = i;
    if (!stable && runStart >= 0) {
      picked.push(runStart, Math.floor((runStart + i - 1) / 2), i - 1);
      runStart = -1;
    }
  }
  return picked;
}

/** The family's members that get a page, in seq order. */
export function pagedMembers({ members, windows, bifurcations, screenedOrbitIds }: PagedMemberInputs): OrbitRow[] {
  if (members.length <= PAGE_EVERY_MEMBER_UP_TO) return [...members];
  const picked = new Set<number>(spreadIndices(members.length, SPREAD_PAGES_PER_FAMILY));
  for (const i of stableRunIndices(members)) picked.add(i);
  const wanted = new Set(windows.map((w) => w.midOrbitId));
  for (const b of bifurcations) {
    if (b.plane !== 'vertical') continue;
    const { before, after } = membersBeside(members, b.arclength);
    for (const o of [before, after]) if (o) wanted.add(o.id);
  }
  members.forEach((o, i) => {
    if (wanted.has(o.id) || screenedOrbitIds.has(o.id)) picked.add(i);
  });
  return [...picked].sort((a, b) => a - b).map((i) => members[i]);
}
