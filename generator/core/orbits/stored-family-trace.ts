// A family already in the catalog (a resumed job's finished families), as the seed search compares
// against it: per member the stored-orbit footprint the audit uses too (audit-footprint.ts: both
// perpendicular crossings, ẏ there, the half period's crossing count, C and the period).
import { storedOrbitFootprint } from './audit-footprint.ts';
import type { FamilyTracePoint } from './discovery/family-coverage.ts';
import type { Tolerance } from '../propagation/tolerance.ts';

export interface StoredFamily {
  id: string;
  members: Array<{ state0: readonly number[]; periodNd: number }>;
}

export interface StoredFamilyTrace {
  id: string;
  points: Array<FamilyTracePoint & { periodNd: number }>;
}

export function storedFamilyTrace(mu: number, family: StoredFamily, tolerance: Tolerance): StoredFamilyTrace {
  return { id: family.id, points: family.members.map(({ state0, periodNd }) => storedOrbitFootprint(mu, state0, periodNd, tolerance)) };
}
