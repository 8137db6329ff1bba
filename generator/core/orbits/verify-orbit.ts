// Re-integrates a stored orbit over one period: how far it is from closing and from keeping C.
import { jacobiConstant } from '../cr3bp/jacobi-constant.ts';
import { propagate } from '../propagation/propagate.ts';
import type { Tolerance } from '../propagation/tolerance.ts';

export interface OrbitCheck {
  closureError: number;
  jacobiDrift: number;
}

/** How far an end state is from the start state, in the state and in the Jacobi constant. */
export function orbitCheck(mu: number, state0: ArrayLike<number>, end: ArrayLike<number>): OrbitCheck {
  return {
    closureError: Math.hypot(...Array.from(end, (v, i) => v - state0[i])),
    jacobiDrift: Math.abs(jacobiConstant(mu, end) - jacobiConstant(mu, state0)),
  };
}

export function verifyOrbit(mu: number, state0: readonly number[], periodNd: number, tolerance: Tolerance): OrbitCheck {
  return orbitCheck(mu, state0, propagate(mu, state0, periodNd, tolerance).state);
}
