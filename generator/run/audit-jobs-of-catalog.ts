// The lap-signature jobs a catalog's families came from, as the generator ran them: read back from each
// done job's stored settings (jobs.settings). Other jobs (Lyapunov, retrograde) are not audited.
import type { StoredJobSettings } from '../../catalog-db/types.ts';
import type { LapSignatureJob } from '../core/orbits/audit-scan.ts';

/** Fields the audit reads, by dotted path, with the type each must have. */
const NEEDED_FIELDS: Array<[string, 'number' | 'string' | 'array']> = [
  ['system.id', 'string'], ['system.mu', 'number'], ['system.primaryLetter', 'string'], ['system.secondaryLetter', 'string'],
  ['system.lengthUnitKm', 'number'], ['system.primaryRadiusKm', 'number'], ['system.secondaryRadiusKm', 'number'],
  ['seed.signature', 'string'], ['seed.segments', 'array'], ['seed.directions', 'array'], ['seed.maxHalfCrossings', 'number'],
  ['seed.gridPoints', 'number'], ['limits.jacobiMin', 'number'], ['limits.jacobiMax', 'number'], ['limits.maxPeriodNd', 'number'],
  ['tolerance.rtol', 'number'], ['tolerance.atol', 'number'],
];

function field(settings: unknown, path: string): unknown {
  return path.split('.').reduce<unknown>((value, key) => (value !== null && typeof value === 'object' ? (value as Record<string, unknown>)[key] : undefined), settings);
}

export function lapSignatureJobsOf(stored: readonly StoredJobSettings[]): LapSignatureJob[] {
  const jobs: LapSignatureJob[] = [];
  for (const row of stored) {
    if (field(row.settings, 'seed.kind') !== 'lap-signature') continue;
    for (const [path, type] of NEEDED_FIELDS) {
      const value = field(row.settings, path);
      const fits = type === 'array' ? Array.isArray(value) : typeof value === type;
      if (!fits) throw new Error(`job ${row.jobKey}: its stored settings have no ${type} ${path} (regenerate the catalog with this version)`);
    }
    jobs.push(row.settings as unknown as LapSignatureJob);
  }
  return jobs;
}
