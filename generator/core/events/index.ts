export type { EventSpec, EventHit } from './event-spec.ts';
export { yAxisCrossing } from './y-axis-crossing.ts';
export { closestApproach } from './closest-approach.ts';
export { EventLocator, toSpatialState, EVENT_TIME_TOLERANCE } from './event-locator.ts';
export { findRootBrent } from './find-root-brent.ts';
