// The footprint of a stored orbit (lies-on-family.ts): its C, period and both perpendicular crossings.
// A catalog stores only the start state, so x at the other crossing comes from propagating half a
// period (mirror theorem, Roy & Ovenden 1955: the orbit crosses the x-axis perpendicularly there).
import { jacobiConstant } from '../cr3bp/jacobi-constant.ts';
import { yAxisCrossing } from '../events/y-axis-crossing.ts';
import { propagate } from '../propagation/propagate.ts';
import type { FamilyMember } from './family-member.ts';
import type { OrbitFootprint } from './lies-on-family.ts';
import type { Tolerance } from '../propagation/tolerance.ts';

/**
 * A stored member as the audit and a resumed seed search compare it: its footprint, its start velocity
 * (for refinement), ẏ at T/2 and the crossing count of the half period (for discovery's coverage).
 */
export interface StoredFootprint extends OrbitFootprint {
  vy0: number;
  vyHalf: number;
  halfCrossings: number;
}

export function storedOrbitFootprint(
  mu: number, state0: readonly number[], periodNd: number, tolerance: Tolerance,
): StoredFootprint {
  const planar = [state0[0], state0[1], state0[3], state0[4]];
  const half = propagate(mu, planar, periodNd / 2, { ...tolerance, events: [yAxisCrossing()] });
  // Crossings strictly between the start and T/2, then T/2 itself (the end point may or may not be reported).
  const inside = half.events.filter((e) => e.tNd > 1e-9 * periodNd && e.tNd < (0.5 - 1e-7) * periodNd).length;
  return {
    x0: state0[0], vy0: state0[4], xHalf: half.state[0], vyHalf: half.state[3], halfCrossings: inside + 1,
    periodNd, jacobi: jacobiConstant(mu, planar, true),
  };
}

/**
 * Footprints in the shape liesOnFamily reads (x0, xHalf, analysis.jacobi, analysis.periodNd and nothing
 * else), so that one membership test serves the generator's members and the catalog's rows.
 */
export function asFamilyMembers(footprints: readonly OrbitFootprint[]): FamilyMember[] {
  type MembershipFields = Pick<FamilyMember, 'x0' | 'xHalf'> & { analysis: Pick<FamilyMember['analysis'], 'jacobi' | 'periodNd'> };
  return footprints.map((f): MembershipFields => ({ x0: f.x0, xHalf: f.xHalf, analysis: { jacobi: f.jacobi, periodNd: f.periodNd } })) as FamilyMember[];
}
