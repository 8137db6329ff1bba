// Discovery grids computed once per run for all the lap-signature jobs that need them (the jobs of a
// system share their segments, directions, levels and tolerances), spread over the worker pool, with
// one progress line for all grid points.
import type { DiscoveryRequest, DiscoveryResult } from '../core/orbits/discovery/discover-candidates.ts';
import { discoveryKey } from '../core/orbits/discovery/discover-candidates.ts';
import { jobDiscoveryRequests } from '../core/orbits/discovery/job-discovery-requests.ts';
import type { FamilyJob } from '../core/orbits/family-job.ts';
import { createRateProgress } from './rate-progress.ts';
import type { FamilyPool } from './worker-pool.ts';

export interface SharedDiscovery {
  /** The grids a job needs; null when a stop request ended any of them. Reference jobs get []. */
  resultsFor(job: FamilyJob): Promise<DiscoveryResult[] | null>;
  /** Grid points of all the grids of this run. */
  readonly points: number;
}

/** One grid per key, deep enough in crossings for every job that uses it. */
export function sharedDiscoveryGrids(jobs: readonly FamilyJob[]): Map<string, DiscoveryRequest> {
  const merged = new Map<string, DiscoveryRequest>();
  for (const request of jobs.flatMap(jobDiscoveryRequests)) {
    const key = discoveryKey(request);
    const known = merged.get(key);
    if (!known || known.maxHalfCrossings < request.maxHalfCrossings) merged.set(key, request);
  }
  return merged;
}

export function startSharedDiscovery(jobs: readonly FamilyJob[], pool: FamilyPool, log: (line: string) => void): SharedDiscovery {
  const merged = sharedDiscoveryGrids(jobs);
  const pointsOf = (r: DiscoveryRequest) => r.gridPoints * r.levels.length;
  const points = [...merged.values()].reduce((sum, r) => sum + pointsOf(r), 0);
  const progress = createRateProgress('discovery grid points', points, log, 10_000);
  const done = new Map<string, number>();
  const step = () => progress.step([...done.values()].reduce((a, b) => a + b, 0), `${merged.size} grids`);
  const results = new Map<string, Promise<DiscoveryResult>>();
  for (const [key, request] of merged) {
    results.set(key, pool.discover(request, (pointsDone) => {
      done.set(key, pointsDone);
      step();
    }));
  }
  return {
    points,
    async resultsFor(job) {
      const needed = jobDiscoveryRequests(job).map((r) => results.get(discoveryKey(r))!);
      const found = await Promise.all(needed);
      return found.some((d) => d.interrupted) ? null : found;
    },
  };
}
