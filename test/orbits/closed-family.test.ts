// A family that is a closed curve in (x0, ẏ0) ends where continuation comes back to it, stored once round.
// Families of symmetric periodic orbits can close on themselves (common practice; Hénon's 1965 survey of the
// restricted problem's families shows closed ones, from memory). This Earth–Moon E2M2 family (far side of
// the Earth, C ≈ 3.0370 … 3.0549) went round about six times to the 5,000-member limit before the
// closed-loop end; it is followed here from one member's start (from an earlier run of this project, only a
// start for Newton) as a hand-off, so no discovery grid is needed.
import { describe, expect, it } from 'vitest';
import type { FamilyJob, JobInputs } from '../../generator/core/orbits/family-job.ts';
import { EARTH_MOON, FOLD_JOB, jobResult } from './helpers/earth-moon-jobs.ts';

const CLOSED_JOB: FamilyJob = {
  key: 'test:E2M2-closed', name: 'E2M2 closed family (test)', system: EARTH_MOON,
  seed: { kind: 'lap-signature', signature: 'E2M2', segments: ['far-primary'], directions: [1], maxHalfCrossings: 8, gridPoints: 300, jacobiValues: [3.05] },
  limits: { ...FOLD_JOB.limits, maxMembers: 5000 },
  tolerance: { rtol: 1e-12, atol: 1e-12 }, indexTolerance: 1e-6,
};
const CLOSED_INPUTS: JobInputs = {
  handoffs: [{ state0: [-1.1663240797552248, 0, 0, 0, 0.18462595127108075, 0], periodNd: 31.9560781219079 }],
};

describe('a closed family', () => {
  const [bundle] = jobResult(CLOSED_JOB, CLOSED_INPUTS).bundles;

  it('ends with closed-loop at both ends, well inside the member limit', () => {
    expect(bundle).toBeDefined();
    expect(bundle!.family.endReasonStart).toBe('closed-loop');
    expect(bundle!.family.endReasonEnd).toBe('closed-loop');
    expect(bundle!.orbits.length).toBeLessThan(CLOSED_JOB.limits.maxMembers / 4);
  });

  it('is stored once round: its two ends are one step apart, its members spread over the whole curve', () => {
    const orbits = bundle!.orbits;
    const [first, last] = [orbits[0]!.state0, orbits[orbits.length - 1]!.state0];
    const gap = Math.hypot(first[0]! - last[0]!, first[4]! - last[4]!);
    expect(gap).toBeLessThan(1.5 * CLOSED_JOB.limits.maxStepNd);
    const arclength = orbits[orbits.length - 1]!.arclength - orbits[0]!.arclength;
    expect(arclength).toBeGreaterThan(10 * gap);
    expect(bundle!.family.jacobiMax - bundle!.family.jacobiMin).toBeGreaterThan(0.01);
  });
});
