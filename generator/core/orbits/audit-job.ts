// The completeness audit of one lap-signature job: at each audit level inside the job's C range, every
// segment and start direction of the job is scanned independently (audit-scan.ts), and each orbit found
// is checked against the job's catalogued families (audit-membership.ts). Pure numerics; the run layer
// reads the catalog, draws the levels and stores the result.
import type { StoredFootprint } from './audit-footprint.ts';
import { liesOnCatalogFamily } from './audit-membership.ts';
import { auditContext, auditScan, type AuditOrbit, type LapSignatureJob } from './audit-scan.ts';

export interface JobAuditInput {
  job: LapSignatureJob;
  /** Audit levels of the job's system; those outside the job's C range are skipped. */
  levels: readonly number[];
  /** Members of each catalogued family of the job, in family order. */
  families: readonly (readonly StoredFootprint[])[];
  /** Scan grid density relative to the job's (audit-scan.ts). */
  gridFactor: number;
}

export interface JobAuditResult {
  /** Distinct orbits found and checked. */
  orbitsChecked: number;
  /** Found orbits on no catalogued family. */
  misses: AuditOrbit[];
  interrupted: boolean;
}

export interface AuditHooks {
  /** After each scan of one level, segment and direction. */
  onScan?(done: number, total: number, label: string): void;
  shouldStop?(): boolean;
}

/** One orbit is found twice when both its perpendicular crossings lie on scanned segments. */
function sameOrbit(a: AuditOrbit, b: AuditOrbit): boolean {
  const close = (p: number, q: number) => Math.abs(p - q) < 1e-7;
  return close(a.jacobi, b.jacobi) && ((close(a.x0, b.x0) && close(a.xHalf, b.xHalf)) || (close(a.x0, b.xHalf) && close(a.xHalf, b.x0)));
}

export function levelsInRange(job: LapSignatureJob, levels: readonly number[]): number[] {
  return levels.filter((c) => c >= job.limits.jacobiMin && c <= job.limits.jacobiMax);
}

/** Scans one job's levels in order: levels × segments × directions steps. */
export function auditScanCount(job: LapSignatureJob, levels: readonly number[]): number {
  return levelsInRange(job, levels).length * job.seed.segments.length * job.seed.directions.length;
}

export function auditJob(input: JobAuditInput, hooks: AuditHooks = {}): JobAuditResult {
  const { job } = input;
  const context = auditContext(job, input.gridFactor);
  const total = auditScanCount(job, input.levels);
  const checked: AuditOrbit[] = [];
  const misses: AuditOrbit[] = [];
  let done = 0;
  for (const jacobi of levelsInRange(job, input.levels)) {
    for (const segment of job.seed.segments) {
      for (const direction of job.seed.directions) {
        if (hooks.shouldStop?.()) return { orbitsChecked: checked.length, misses, interrupted: true };
        for (const orbit of auditScan(context, jacobi, segment, direction)) {
          if (checked.some((seen) => sameOrbit(seen, orbit))) continue;
          checked.push(orbit);
          if (!liesOnCatalogFamily(context, orbit, input.families)) misses.push(orbit);
        }
        hooks.onScan?.(++done, total, `${job.key} C=${jacobi.toFixed(6)} ${segment} ${direction > 0 ? '+' : '-'}`);
      }
    }
  }
  return { orbitsChecked: checked.length, misses, interrupted: false };
}
