// Turns a continued, analysed family into catalog rows (nondimensional values plus km and days).
import { familySummary } from './family-summary.ts';
import { stableWindowRow } from './stable-window-row.ts';
import type { BifurcationRow, FamilyBundle, FamilyKind, OrbitRow, SignatureChangeRow } from './family-rows.ts';
import type { EndReason } from './continue-family.ts';
import type { FamilyMember } from './family-member.ts';
import type { SystemSpec } from './family-job.ts';
import { formatSignature } from '../cr3bp/lap-signature.ts';
import type { StabilityMap } from './locate-stability-changes.ts';
import { synodicLock } from './synodic-lock.ts';

export interface FamilyIdentity {
  id: string;
  jobKey: string;
  name: string;
  kind: FamilyKind;
  /** The signature label (cyclers: E{n}M{m}; reference families: their own label). */
  signature: string;
  seedSegment: string;
}

const SECONDS_PER_DAY = 86400;

export function orbitRowOf(system: SystemSpec, familyId: string, seq: number, member: FamilyMember): OrbitRow {
  const a = member.analysis;
  const km = system.lengthUnitKm;
  const periodDays = (a.periodNd * system.timeUnitS) / SECONDS_PER_DAY;
  const lock = system.synodicPeriodDays ? synodicLock(periodDays, system.synodicPeriodDays) : null;
  return {
    id: `${familyId}/${String(seq).padStart(4, '0')}`,
    familyId,
    seq,
    arclength: member.arclength,
    state0: [...a.state0],
    jacobi: a.jacobi,
    period: a.periodNd,
    periodDays,
    stabilityIndex: a.stabilityIndex,
    verticalStabilityIndex: a.verticalStabilityIndex,
    eigenvalues: a.eigenvalues,
    monodromy: Array.from(a.monodromy),
    primaryMinRadiusKm: a.primaryMinDistanceNd * km,
    primaryMinAltKm: a.primaryMinDistanceNd * km - system.primaryRadiusKm,
    secondaryMinRadiusKm: a.secondaryMinDistanceNd * km,
    secondaryMinAltKm: a.secondaryMinDistanceNd * km - system.secondaryRadiusKm,
    maxDistanceKm: a.maxDistanceNd * km,
    l1Passages: a.l1Passages,
    signature: formatSignature(system.primaryLetter, system.secondaryLetter, a.laps),
    synodicP: lock ? lock.p : null,
    synodicQ: lock ? lock.q : null,
    synodicRelError: lock ? lock.relativeError : null,
    closureError: a.closureError,
    jacobiDrift: a.jacobiDrift,
    stable: Math.abs(a.stabilityIndex) < 1,
  };
}

export interface FamilyEnds {
  start: EndReason;
  end: EndReason;
  /** The first orbit past a 'signature-change' end (continue-family.ts). */
  beyondStart?: FamilyMember;
  beyondEnd?: FamilyMember;
}

/** The orbit past a signature-change end, as a row; the family it lies on is found by the run layer. */
function signatureChangeRow(system: SystemSpec, familyId: string, side: 'start' | 'end', beyond: FamilyMember): SignatureChangeRow {
  const row = orbitRowOf(system, familyId, 0, beyond);
  return {
    familyId, side, signature: row.signature, state0: row.state0, jacobi: row.jacobi, period: row.period,
    periodDays: row.periodDays, intoFamilyId: null, followedUp: false,
  };
}

export function buildFamilyBundle(
  system: SystemSpec, identity: FamilyIdentity, map: StabilityMap, ends: FamilyEnds,
): FamilyBundle {
  const id = identity.id;
  // Window middles join the member list so that every window names a stored orbit.
  const members = [...map.members];
  for (const w of map.windows) if (!members.includes(w.middle)) members.push(w.middle);
  members.sort((p, q) => p.arclength - q.arclength);
  const orbits = members.map((m, seq) => orbitRowOf(system, id, seq, m));
  const rowOf = new Map(members.map((m, i) => [m, orbits[i]]));

  const stableWindows = map.windows.map((w, k) =>
    stableWindowRow(`${id}/window-${k + 1}`, id, rowOf.get(w.from)!, rowOf.get(w.to)!, rowOf.get(w.middle)!));
  const bifurcations: BifurcationRow[] = map.changes.map((c, k) => {
    const row = rowOf.get(c.member)!;
    return {
      id: `${id}/bifurcation-${k + 1}`,
      familyId: id,
      kind: c.target === 1 ? 'tangent' : 'period-doubling',
      plane: c.kind,
      arclength: row.arclength,
      jacobi: row.jacobi,
      secondaryMinAltKm: row.secondaryMinAltKm,
      periodDays: row.periodDays,
      state0: row.state0,
    };
  });
  const first = members[0].analysis.laps;
  return {
    family: {
      id,
      systemId: system.id,
      runId: 0,
      configKey: identity.jobKey,
      name: identity.name,
      kind: identity.kind,
      signature: identity.signature,
      primaryLaps: first.primaryLaps,
      secondaryLaps: first.secondaryLaps,
      seedSegment: identity.seedSegment,
      endReasonStart: ends.start,
      endReasonEnd: ends.end,
      ...familySummary(orbits, stableWindows),
    },
    orbits,
    stableWindows,
    bifurcations,
    signatureChanges: [
      ...(ends.beyondStart ? [signatureChangeRow(system, id, 'start', ends.beyondStart)] : []),
      ...(ends.beyondEnd ? [signatureChangeRow(system, id, 'end', ends.beyondEnd)] : []),
    ],
  };
}
