// A continuation from a seed off every known family can still run onto one: the known family ended early
// on its side (a stretch it could not pass) while this march came from the other side and went on. Then the
// new members between the seed and the known family are a family part of their own, which meets the known
// one; the members that repeat it are dropped. A few members in common are no such meeting: families cross
// at bifurcations, and the march goes on past the crossing.
import type { ContinuationResult, EndReason } from './continue-family.ts';
import type { FamilyMember } from './family-member.ts';

/** Consecutive known members that make a meeting with a known family (not a crossing). */
export const MEETING_RUN_MEMBERS = 8;

export type PartedContinuation = { kind: 'new'; result: ContinuationResult } | { kind: 'known' };

/** The first index, walking from `from` by `by`, where a run of known members long enough (or to the end) starts. */
function meetingAt(known: readonly boolean[], from: number, by: 1 | -1): number | null {
  for (let i = from; i >= 0 && i < known.length; i += by) {
    if (!known[i]) continue;
    let run = 0;
    for (let j = i; j >= 0 && j < known.length && known[j]; j += by) run++;
    const toEnd = by === 1 ? i + run === known.length : i - run === -1;
    if (run >= MEETING_RUN_MEMBERS || toEnd) return i;
  }
  return null;
}

/**
 * The part of a continuation that no known family has, around its seed: cut where a sustained run of known
 * members starts, with 'joins-family' at that end; 'known' when that part is no longer than a meeting run.
 */
export function partOffKnownFamilies(result: ContinuationResult, seed: FamilyMember, isKnown: (m: FamilyMember) => boolean): PartedContinuation {
  const at = result.members.indexOf(seed);
  const known = result.members.map((m) => m !== seed && isKnown(m));
  if (!known.some(Boolean)) return { kind: 'new', result };
  const before = meetingAt(known, at - 1, -1), after = meetingAt(known, at + 1, 1);
  const first = before === null ? 0 : before + 1, last = after === null ? result.members.length - 1 : after - 1;
  if (before === null && after === null) return { kind: 'new', result };
  if (last - first + 1 <= MEETING_RUN_MEMBERS) return { kind: 'known' };
  const joined: EndReason = 'joins-family';
  return {
    kind: 'new',
    result: {
      members: result.members.slice(first, last + 1),
      endReasonStart: before === null ? result.endReasonStart : joined,
      endReasonEnd: after === null ? result.endReasonEnd : joined,
      ...(before === null && result.beyondStart ? { beyondStart: result.beyondStart } : {}),
      ...(after === null && result.beyondEnd ? { beyondEnd: result.beyondEnd } : {}),
    },
  };
}
