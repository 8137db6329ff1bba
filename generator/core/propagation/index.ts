export { propagate, DEFAULT_TOLERANCE } from './propagate.ts';
export type { PropagateOptions, PropagationResult } from './propagate.ts';
export { distanceToPrimary, distanceToSecondary } from './primary-distances.ts';
export { sampleTrajectory } from './sample-trajectory.ts';
export type { TrajectorySamples } from './sample-trajectory.ts';
