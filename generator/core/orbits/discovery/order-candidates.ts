// The order in which a job tries the root edges of its signature: largest pieces of the zero set first
// (the long families), and inside a piece its middle edge first, then the rest in grid order. Fixed
// order makes a run and its resumption name the same families with the same letters.
import type { LapCounts } from '../lap-signature.ts';
import type { ZeroCandidate } from './zero-candidate.ts';

export function candidatesOfSignature(candidates: readonly ZeroCandidate[], laps: LapCounts, maxHalfCrossings: number): ZeroCandidate[] {
  return candidates.filter((c) => c.halfCrossings <= maxHalfCrossings && c.l1Passages > 0
    && c.laps.some((l) => l.primaryLaps === laps.primaryLaps && l.secondaryLaps === laps.secondaryLaps));
}

export function orderCandidates(candidates: readonly ZeroCandidate[]): ZeroCandidate[] {
  const pieces = new Map<string, ZeroCandidate[]>();
  for (const c of candidates) {
    const key = `${c.segment}${c.direction}:${c.piece}`;
    const list = pieces.get(key);
    if (list) list.push(c);
    else pieces.set(key, [c]);
  }
  const grouped = [...pieces.values()].map((list) => list.sort((a, b) => a.j - b.j || a.i - b.i || (a.along < b.along ? -1 : 1)));
  grouped.sort((a, b) => b.length - a.length || compareFirst(a[0]!, b[0]!));
  return grouped.flatMap((list) => {
    const middle = Math.floor(list.length / 2);
    return [list[middle]!, ...list.slice(0, middle), ...list.slice(middle + 1)];
  });
}

function compareFirst(a: ZeroCandidate, b: ZeroCandidate): number {
  return a.segment.localeCompare(b.segment) || a.direction - b.direction || a.halfCrossings - b.halfCrossings || a.j - b.j || a.i - b.i;
}
