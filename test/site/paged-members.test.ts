// Which members of a long family get a page (site/lib/paged-members.ts): the rule is the product's own, so
// the checks are of the rule as stated: ends, an even spread, every stable run's first, middle and last
// member, window middles, screened members and the members beside a vertical bifurcation; short
// families keep a page for every member.
import { describe, expect, it } from 'vitest';
import type { BifurcationRow, OrbitRow, StableWindowRow } from '../../catalog-db/types.ts';
import { PAGE_EVERY_MEMBER_UP_TO, SPREAD_PAGES_PER_FAMILY, pagedMembers } from '../../site/lib/paged-members.ts';

const member = (seq: number, stable: boolean): OrbitRow =>
  ({ id: `f/${seq}`, familyId: 'f', seq, arclength: seq * 0.01, stable } as unknown as OrbitRow);

function family(n: number, stableRuns: Array<[number, number]>): OrbitRow[] {
  return Array.from({ length: n }, (_, seq) => member(seq, stableRuns.some(([a, b]) => seq >= a && seq <= b)));
}

describe('paged members', () => {
  it('keeps every member of a short family', () => {
    const members = family(PAGE_EVERY_MEMBER_UP_TO, [[3, 9]]);
    expect(pagedMembers({ members, windows: [], bifurcations: [], screenedOrbitIds: new Set() })).toEqual(members);
  });

  it('pages the ends, a spread, each stable run, window middles, screened members and bifurcation neighbours of a long family', () => {
    const members = family(2000, [[501, 540], [1203, 1203]]);
    const windows = [{ midOrbitId: 'f/517' } as StableWindowRow];
    const bifurcations = [
      { plane: 'vertical', arclength: 7.775 } as BifurcationRow, // between members 777 and 778
      { plane: 'in-plane', arclength: 15.555 } as BifurcationRow, // in-plane: its neighbours are not asked for
    ];
    const paged = pagedMembers({ members, windows, bifurcations, screenedOrbitIds: new Set(['f/530', 'f/1999']) });
    const seqs = paged.map((o) => o.seq);
    expect(seqs).toEqual([...seqs].sort((a, b) => a - b));
    for (const seq of [0, 1999, 501, 520, 540, 1203, 517, 530, 777, 778]) expect(seqs, `member ${seq}`).toContain(seq);
    expect(seqs).not.toContain(1555);
    expect(seqs).not.toContain(1556);
    // Spread: no gap between paged members longer than one spread interval.
    const gaps = seqs.slice(1).map((s, i) => s - seqs[i]);
    expect(Math.max(...gaps)).toBeLessThanOrEqual(Math.ceil(1999 / (SPREAD_PAGES_PER_FAMILY - 1)));
    expect(paged.length).toBeLessThanOrEqual(SPREAD_PAGES_PER_FAMILY + 3 * 2 + 1 + 2 + 2);
  });
});
