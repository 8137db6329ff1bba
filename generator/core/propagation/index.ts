export { propagate } from './propagate.ts';
export { DEFAULT_TOLERANCE, type Tolerance } from './tolerance.ts';
export type { PropagateOptions, PropagationResult } from './propagate.ts';
export { distanceToPrimary, distanceToSecondary } from './primary-distances.ts';
export { sampleTrajectory } from './sample-trajectory.ts';
export type { TrajectorySamples } from './sample-trajectory.ts';
