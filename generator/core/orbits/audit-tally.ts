// The running account of one job's audit: each orbit found is counted once (an orbit is found twice when
// both its perpendicular crossings lie on scanned segments) and checked against the job's catalogued
// families (audit-membership.ts); those on none are the misses.
import type { StoredFootprint } from './audit-footprint.ts';
import { liesOnCatalogFamily } from './audit-membership.ts';
import { auditContext, type AuditContext, type AuditOrbit, type LapSignatureJob } from './audit-scan.ts';

function sameOrbit(a: AuditOrbit, b: AuditOrbit): boolean {
  const close = (p: number, q: number) => Math.abs(p - q) < 1e-7;
  return close(a.jacobi, b.jacobi) && ((close(a.x0, b.x0) && close(a.xHalf, b.xHalf)) || (close(a.x0, b.xHalf) && close(a.xHalf, b.x0)));
}

export class JobAuditTally {
  readonly checked: AuditOrbit[] = [];
  readonly misses: AuditOrbit[] = [];
  private readonly context: AuditContext;

  constructor(
    readonly job: LapSignatureJob,
    gridFactor: number,
    /** Members of each catalogued family of the job, in family order. */
    private readonly families: readonly (readonly StoredFootprint[])[],
  ) {
    this.context = auditContext(job, gridFactor);
  }

  add(orbits: readonly AuditOrbit[]): void {
    for (const orbit of orbits) {
      if (this.checked.some((seen) => sameOrbit(seen, orbit))) continue;
      this.checked.push(orbit);
      if (!liesOnCatalogFamily(this.context, orbit, this.families)) this.misses.push(orbit);
    }
  }
}
