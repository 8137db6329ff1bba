// The order in which a job tries the root edges of its signature: largest pieces of the zero set first
// (the long families), and inside a piece its middle edge first, then the rest in grid order. Fixed
// order makes a run and its resumption name the same families with the same letters.
import type { LapCounts } from '../../cr3bp/lap-signature.ts';
import type { EndCounts, ZeroCandidate } from './zero-candidate.ts';

/**
 * Root edges that may hold an orbit of the signature: one end has it, or (ends that disagree) it lies
 * between the ends' counts. Where the orbit's turn at T/2 is a near-brake point, the trajectories on either
 * side of the root make one loop more or one fewer there than the orbit itself (E2M3 and E0M3 either side of
 * an E1M3 root); and some end passes the L1 neck. followSeed checks the corrected orbit itself.
 */
export function candidatesOfSignature(candidates: readonly ZeroCandidate[], laps: LapCounts, maxHalfCrossings: number): ZeroCandidate[] {
  const between = (value: number, a: number, b: number) => value >= Math.min(a, b) && value <= Math.max(a, b);
  return candidates.filter((c) => {
    if (c.halfCrossings > maxHalfCrossings || !c.laps.some((l) => l.l1Passages > 0)) return false;
    const [a, b = a] = c.laps as [EndCounts, EndCounts?];
    return between(laps.primaryLaps, a.primaryLaps, b.primaryLaps) && between(laps.secondaryLaps, a.secondaryLaps, b.secondaryLaps);
  });
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
