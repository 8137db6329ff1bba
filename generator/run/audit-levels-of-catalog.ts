// Where the audit scans: per system, `count` Jacobi levels drawn with one seeded stream (systems in id
// order) uniformly between the system's lowest scan level C(L3) (or the jobs' lower C limit, if higher)
// and just below C(L1) (or the jobs' upper limit, if lower), away from every level discovery used.
import { systemJacobiBounds } from '../config/system-jacobi-bounds.ts';
import { drawAuditLevels } from '../core/orbits/audit-levels.ts';
import type { LapSignatureJob } from '../core/orbits/audit-scan.ts';
import { seededRandom } from '../core/random/seeded-random.ts';

/** Gap kept below C(L1): the neck closes at C(L1), and there no orbit passes it. */
export const BELOW_L1_GAP = 1e-6;

/** The levels discovery scanned for a job: its fixed levels (a grid's levels would be added here). */
export function discoveryLevelsOf(job: LapSignatureJob): number[] {
  return job.seed.jacobiValues ?? [];
}

export function auditLevelsOfCatalog(jobs: readonly LapSignatureJob[], count: number, seed: number): Record<string, number[]> {
  const bySystem = new Map<string, LapSignatureJob[]>();
  for (const job of jobs) bySystem.set(job.system.id, [...(bySystem.get(job.system.id) ?? []), job]);
  const draw = seededRandom(seed);
  const levels: Record<string, number[]> = {};
  for (const systemId of [...bySystem.keys()].sort()) {
    const systemJobs = bySystem.get(systemId)!;
    const bounds = systemJacobiBounds(systemJobs[0].system.mu);
    const range = {
      min: Math.max(bounds.l3, Math.min(...systemJobs.map((j) => j.limits.jacobiMin))),
      max: Math.min(bounds.l1 - BELOW_L1_GAP, Math.max(...systemJobs.map((j) => j.limits.jacobiMax))),
    };
    levels[systemId] = drawAuditLevels(draw, count, range, systemJobs.flatMap(discoveryLevelsOf));
  }
  return levels;
}
