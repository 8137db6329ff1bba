// verify's look at one stored orbit: re-integrate it with its state-transition matrix over its stored
// period and compare everything stored with what that re-integration gives. The closure limit scales
// with the eigenvalues of the re-integrated monodromy, never with the stored ones (a corrupted
// eigenvalue must not hide a corrupted state).
import type { OrbitRow } from '../../catalog-db/types.ts';
import { jacobiConstant } from '../core/cr3bp/jacobi-constant.ts';
import { eigenvaluePair, stabilityIndices } from '../core/orbits/stability-indices.ts';
import { orbitCheck } from '../core/orbits/verify-orbit.ts';
import { propagate } from '../core/propagation/propagate.ts';
import { largestEigenvalueModulus, STORED_VALUE_RELATIVE_LIMIT, verifyLimitsFor, type VerifyLimits } from './verify-limits.ts';
import type { Tolerance } from '../core/propagation/tolerance.ts';

export type StoredOrbit = Pick<
  OrbitRow,
  'state0' | 'period' | 'periodDays' | 'jacobi' | 'stabilityIndex' | 'verticalStabilityIndex' | 'eigenvalues'
>;

export interface OrbitRecheck {
  closureError: number;
  jacobiDrift: number;
  /** Largest |λ| of the re-integrated monodromy (NaN when the integration failed). */
  largestEigenvalueModulus: number;
  limits: VerifyLimits;
  /** One phrase per stored value that disagrees with the re-integration (empty: all agree). */
  disagreements: string[];
}

const SECONDS_PER_DAY = 86400;

export function recheckOrbit(
  mu: number,
  timeUnitS: number,
  orbit: StoredOrbit,
  run: Tolerance,
  tolerance: Tolerance,
): OrbitRecheck {
  const disagreements: string[] = [];
  const failed = (why: string): OrbitRecheck => ({
    closureError: Number.NaN, jacobiDrift: Number.NaN, largestEigenvalueModulus: Number.NaN,
    limits: verifyLimitsFor(run, 1), disagreements: [...disagreements, why],
  });
  if (!(Number.isFinite(orbit.period) && orbit.period > 0)) return failed(`period ${orbit.period} is not a positive number`);
  const limits0 = verifyLimitsFor(run, 1);
  const jacobiOfState = jacobiConstant(mu, orbit.state0);
  if (!(Math.abs(jacobiOfState - orbit.jacobi) <= limits0.jacobiDrift)) {
    disagreements.push(`stored Jacobi constant ${orbit.jacobi} differs from its state's ${jacobiOfState}`);
  }
  const periodDays = (orbit.period * timeUnitS) / SECONDS_PER_DAY;
  if (!agree(orbit.periodDays, periodDays)) disagreements.push(`stored period ${orbit.periodDays} d differs from ${periodDays} d (period × time unit)`);

  let end: ReturnType<typeof propagate>;
  try {
    end = propagate(mu, orbit.state0, orbit.period, { ...tolerance, stm: true });
  } catch (error) {
    return failed(`re-integration failed (${error instanceof Error ? error.message : String(error)})`);
  }
  const indices = stabilityIndices(end.stm!);
  const eigenvalues = [...eigenvaluePair(indices.inPlane), ...eigenvaluePair(indices.vertical)];
  const lambda = largestEigenvalueModulus(eigenvalues);
  const limits = verifyLimitsFor(run, lambda);
  if (!agree(orbit.stabilityIndex, indices.inPlane)) {
    disagreements.push(`stored stability index ${orbit.stabilityIndex} differs from the re-integrated ${indices.inPlane}`);
  }
  if (!agree(orbit.verticalStabilityIndex, indices.vertical)) {
    disagreements.push(`stored vertical index ${orbit.verticalStabilityIndex} differs from the re-integrated ${indices.vertical}`);
  }
  // The eigenvalues follow from the indices (λ + 1/λ = 2ν); near |ν| = 1 a tiny change of ν moves λ a
  // lot, so they are checked against the stored indices, which are checked against the re-integration.
  const storedLambda = largestEigenvalueModulus(orbit.eigenvalues);
  const lambdaOfStoredIndices = largestEigenvalueModulus([
    ...eigenvaluePair(orbit.stabilityIndex),
    ...eigenvaluePair(orbit.verticalStabilityIndex),
  ]);
  if (!agree(storedLambda, lambdaOfStoredIndices)) {
    disagreements.push(`stored largest eigenvalue modulus ${storedLambda} differs from the ${lambdaOfStoredIndices} of its stability indices`);
  }
  return { ...orbitCheck(mu, orbit.state0, end.state), largestEigenvalueModulus: lambda, limits, disagreements };
}

/** Equal to STORED_VALUE_RELATIVE_LIMIT relative to the larger of the two (and of 1). */
function agree(stored: number, recomputed: number): boolean {
  return Math.abs(stored - recomputed) <= STORED_VALUE_RELATIVE_LIMIT * Math.max(1, Math.abs(stored), Math.abs(recomputed));
}
