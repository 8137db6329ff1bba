// The newest completeness audit of a catalog file, for a page that needs only that (the site's home).
import { openCatalogForRead } from './open-catalog.ts';
import type { AuditRow } from './audit-types.ts';

export function readLatestAudit(path: string): AuditRow | undefined {
  const reader = openCatalogForRead(path);
  try {
    return reader.latestAudit();
  } finally {
    reader.close();
  }
}

/** One sentence on the newest audit, e.g. for the site's home page; says so when a generator run started
 *  after it (latestRunStartedAt, ISO 8601), since the audit then may not describe the catalog as it is. */
export function auditSummary(audit: AuditRow | undefined, latestRunStartedAt?: string): string {
  if (audit === undefined) return 'Completeness audit: not run on this catalog yet (cycler-atlas audit).';
  const levels = Object.values(audit.levels).reduce((sum, list) => sum + list.length, 0);
  const verdict = audit.misses.length === 0
    ? 'every one lies on a catalogued family'
    : `${audit.misses.length} ${audit.misses.length === 1 ? 'lies' : 'lie'} on no catalogued family`;
  return `Completeness audit of ${audit.finishedAt.slice(0, 10)}: ${audit.orbitsChecked} symmetric orbits found afresh at ${levels} random ` +
    `Jacobi levels (seed ${audit.seed}) for ${audit.jobsAudited} lap signature${audit.jobsAudited === 1 ? '' : 's'}; ${verdict}` +
    `${latestRunStartedAt !== undefined && latestRunStartedAt > audit.finishedAt ? ' (the catalog has been generated further since)' : ''}.`;
}
