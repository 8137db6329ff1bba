// Every crossing of ν = ±1 (in-plane and vertical) between neighbouring members, located and inserted
// into the family, plus the stable windows (maximal stretches with |ν| < 1) they bound.
import type { AnalysisContext } from './analyse-orbit.ts';
import type { CorrectorOptions } from './correct-on-arc.ts';
import type { FamilyMember } from './family-member.ts';
import { indexOf, locateIndexCrossing, memberBetween, type IndexKind } from './locate-index-crossing.ts';

export interface StabilityChange {
  member: FamilyMember;
  kind: IndexKind;
  /** +1: tangent bifurcation, −1: period doubling. */
  target: 1 | -1;
}

export interface StableStretch {
  from: FamilyMember;
  to: FamilyMember;
  middle: FamilyMember;
}

export interface StabilityMap {
  /** The members with the located edge members inserted, ordered by arclength. */
  members: FamilyMember[];
  changes: StabilityChange[];
  windows: StableStretch[];
}

export function locateStabilityChanges(
  context: AnalysisContext, members: readonly FamilyMember[], indexTolerance: number,
  corrector: CorrectorOptions, shouldStop?: () => boolean,
): StabilityMap | null {
  const changes: StabilityChange[] = [];
  const all: FamilyMember[] = [];
  for (let i = 0; i < members.length; i++) {
    if (shouldStop?.()) return null; // a stop request: the family is not finished
    all.push(members[i]);
    if (i + 1 === members.length) break;
    const a = members[i], b = members[i + 1];
    const found: StabilityChange[] = [];
    for (const kind of ['in-plane', 'vertical'] as const) {
      for (const target of [1, -1] as const) {
        if ((indexOf(a, kind) - target) * (indexOf(b, kind) - target) < 0) {
          const member = locateIndexCrossing(context, a, b, kind, target, indexTolerance, corrector);
          if (member) found.push({ member, kind, target });
        }
      }
    }
    found.sort((p, q) => p.member.arclength - q.member.arclength);
    for (const change of found) {
      changes.push(change);
      all.push(change.member);
    }
  }
  return { members: all, changes, windows: stableStretches(context, all, changes, corrector) };
}

function stableStretches(
  context: AnalysisContext, members: FamilyMember[], changes: StabilityChange[],
  corrector: CorrectorOptions,
): StableStretch[] {
  const edges = new Set(changes.filter((c) => c.kind === 'in-plane').map((c) => c.member));
  const inside = (m: FamilyMember) => edges.has(m) || Math.abs(m.analysis.stabilityIndex) < 1;
  const stretches: StableStretch[] = [];
  for (let i = 0; i < members.length; i++) {
    if (!inside(members[i])) continue;
    let j = i;
    while (j + 1 < members.length && inside(members[j + 1])) j++;
    // A run of edges alone may bound an unstable gap; its middle decides.
    if (j > i) {
      const middle = middleOf(context, members, i, j, corrector);
      if (Math.abs(middle.analysis.stabilityIndex) < 1) stretches.push({ from: members[i], to: members[j], middle });
    }
    i = j;
  }
  return stretches;
}

/** The member at the arclength midpoint of members[i..j], corrected there. */
function middleOf(
  context: AnalysisContext, members: FamilyMember[], i: number, j: number, corrector: CorrectorOptions,
): FamilyMember {
  const target = 0.5 * (members[i].arclength + members[j].arclength);
  let k = i;
  while (k < j && members[k + 1].arclength < target) k++;
  if (k === j) return members[j];
  const a = members[k], b = members[k + 1];
  const sigma = (target - a.arclength) / (b.arclength - a.arclength);
  return memberBetween(context, a, b, sigma, corrector) ?? (sigma < 0.5 ? a : b);
}
