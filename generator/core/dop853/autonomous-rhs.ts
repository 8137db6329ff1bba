import type { Rhs, RhsFunction } from './workspace.ts';

/**
 * Marks a right-hand side that does not depend on t (the CR3BP equations). The trial step then hands it the
 * step's start time at every stage, a number V8 already holds boxed, instead of each stage's own time: the
 * boxing of eleven fresh times per trial step costs about 5% of a state-only run.
 */
export function autonomousRhs(f: RhsFunction): Rhs {
  return Object.assign(f, { autonomous: true });
}
