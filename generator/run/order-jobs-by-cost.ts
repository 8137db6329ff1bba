// Longest jobs first (LPT scheduling, Graham 1969): a family job cannot be split across workers, so a long
// job started last would leave the other workers idle at the end of the run.
import type { FamilyJob } from '../core/orbits/family-job.ts';

/** Rough relative cost: the seed scan's propagations, each as long as the crossings it follows. */
export function estimatedJobCost(job: FamilyJob): number {
  const seed = job.seed;
  if (seed.kind !== 'lap-signature') return 1;
  return seed.jacobiValues.length * seed.segments.length * seed.directions.length * seed.gridPoints * seed.maxHalfCrossings;
}

export function orderJobsByCost(jobs: readonly FamilyJob[]): FamilyJob[] {
  return jobs
    .map((job, index) => ({ job, index, cost: estimatedJobCost(job) }))
    .sort((a, b) => b.cost - a.cost || a.index - b.index)
    .map((entry) => entry.job);
}
