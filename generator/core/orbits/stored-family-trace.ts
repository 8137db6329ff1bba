// A family already in the catalog (a resumed job's finished families), as the seed search compares
// against it: per member both perpendicular crossings, ẏ there, C and the period. A catalog stores the
// start state only, so the other crossing comes from propagating half a period (mirror theorem,
// Roy & Ovenden 1955), and the crossing count of the half period from counting the crossings on the way.
import { jacobiConstant } from '../cr3bp/jacobi-constant.ts';
import { yAxisCrossing } from '../events/y-axis-crossing.ts';
import { propagate } from '../propagation/propagate.ts';
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
  const points = family.members.map(({ state0, periodNd }) => {
    const planar = [state0[0]!, state0[1]!, state0[3]!, state0[4]!];
    // A little past T/2 so that the perpendicular crossing there is counted, well before the next one.
    const run = propagate(mu, planar, periodNd * (0.5 + 1e-7), { ...tolerance, events: [yAxisCrossing()] });
    const crossings = run.events.filter((e) => e.tNd > 1e-9 * periodNd);
    const half = crossings[crossings.length - 1];
    return {
      x0: planar[0]!, vy0: planar[3]!, xHalf: half ? half.state[0]! : NaN, vyHalf: half ? half.state[4]! : NaN,
      jacobi: jacobiConstant(mu, planar, true), periodNd, halfCrossings: crossings.length,
    };
  });
  return { id: family.id, points };
}
