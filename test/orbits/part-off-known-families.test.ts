// A new continuation that runs onto a known family keeps its own part up to the meeting; isolated orbits in
// common (two families cross at a bifurcation and share one orbit there, common practice in continuation:
// Doedel et al. 2007) cut nothing. Members here are plain records; only which of them are known matters.
import { describe, expect, it } from 'vitest';
import type { ContinuationResult } from '../../generator/core/orbits/continue-family.ts';
import type { FamilyMember } from '../../generator/core/orbits/family-member.ts';
import { MEETING_RUN_MEMBERS, partOffKnownFamilies } from '../../generator/core/orbits/part-off-known-families.ts';

const members = (n: number) => Array.from({ length: n }, (_, i) => ({ x0: i }) as unknown as FamilyMember);
const result = (ms: FamilyMember[]): ContinuationResult => ({ members: ms, endReasonStart: 'collision-secondary', endReasonEnd: 'period-limit' });
const knownWhere = (ms: FamilyMember[], test: (i: number) => boolean) => (m: FamilyMember) => test(ms.indexOf(m));

describe('parting a continuation off known families', () => {
  it('keeps a continuation that touches no known family whole', () => {
    const ms = members(100);
    const parted = partOffKnownFamilies(result(ms), ms[50]!, () => false);
    expect(parted).toEqual({ kind: 'new', result: result(ms) });
  });

  it('cuts where a sustained run of known members starts, and ends there with joins-family', () => {
    const ms = members(100);
    const parted = partOffKnownFamilies(result(ms), ms[70]!, knownWhere(ms, (i) => i < 40));
    expect(parted.kind).toBe('new');
    if (parted.kind !== 'new') return;
    expect(parted.result.members[0]).toBe(ms[40]);
    expect(parted.result.members.at(-1)).toBe(ms[99]);
    expect(parted.result.endReasonStart).toBe('joins-family');
    expect(parted.result.endReasonEnd).toBe('period-limit');
  });

  it('cuts nothing at a crossing: a few known members with new ones beyond', () => {
    const ms = members(100);
    const crossing = (i: number) => i >= 20 && i < 20 + MEETING_RUN_MEMBERS - 2;
    const parted = partOffKnownFamilies(result(ms), ms[60]!, knownWhere(ms, crossing));
    expect(parted).toEqual({ kind: 'new', result: result(ms) });
  });

  it('calls a continuation known when its own part is no longer than a meeting run', () => {
    const ms = members(100);
    const parted = partOffKnownFamilies(result(ms), ms[50]!, knownWhere(ms, (i) => i < 48 || i > 53));
    expect(parted).toEqual({ kind: 'known' });
  });

  it('cuts at a short known run that reaches the end of the continuation', () => {
    const ms = members(100);
    const parted = partOffKnownFamilies(result(ms), ms[10]!, knownWhere(ms, (i) => i >= 97));
    expect(parted.kind === 'new' && parted.result.members.length).toBe(97);
    expect(parted.kind === 'new' && parted.result.endReasonEnd).toBe('joins-family');
  });
});
