// Every lap-signature job of a system scans the same x-axis segments at the same Jacobi constants; a worker
// keeps its scans so that the next job reuses them. A scan with more half crossings answers any request
// for fewer (its roots at k ≤ K are the same).
import type { AxisSegment } from './family-job.ts';
import { scanAxisSegment, type ScanOptions, type SeedCandidate } from './scan-axis-segment.ts';

const scans = new Map<string, { maxHalfCrossings: number; candidates: SeedCandidate[] }>();
const MAX_ENTRIES = 256;

export function cachedScan(
  mu: number, jacobi: number, segment: AxisSegment, direction: 1 | -1, maxHalfCrossings: number,
  gridPoints: number, options: ScanOptions,
): SeedCandidate[] {
  const key = JSON.stringify([mu, jacobi, segment, direction, gridPoints, options]);
  const hit = scans.get(key);
  if (hit && hit.maxHalfCrossings >= maxHalfCrossings) {
    return hit.candidates.filter((c) => c.halfCrossings <= maxHalfCrossings);
  }
  const candidates = scanAxisSegment(mu, jacobi, segment, direction, maxHalfCrossings, gridPoints, options);
  if (scans.size >= MAX_ENTRIES) scans.delete(scans.keys().next().value!);
  scans.set(key, { maxHalfCrossings, candidates });
  return candidates;
}
