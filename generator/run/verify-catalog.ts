// `verify`: re-integrates every stored orbit (or one family's) with its state-transition matrix over
// its period, at a tolerance set by the run that produced it, and lists those that miss the limits of
// verify-limits.ts or whose stored values disagree with the re-integration (recheck-orbit.ts).
import { openCatalogForRead } from '../../catalog-db/open-catalog.ts';
import type { RunRow } from '../../catalog-db/types.ts';
import { recheckOrbit } from './recheck-orbit.ts';
import { verifyToleranceFor, type VerifyLimits } from './verify-limits.ts';

export interface OrbitVerdict {
  orbitId: string;
  closureError: number;
  jacobiDrift: number;
  /** Of the re-integrated monodromy. */
  largestEigenvalueModulus: number;
  limits: VerifyLimits;
  /** Stored values that disagree with the re-integration. */
  disagreements: string[];
}

export interface VerifyReport {
  orbitsChecked: number;
  failures: OrbitVerdict[];
  worstClosure: number;
  worstDrift: number;
  seconds: number;
}

export function verifyCatalog(dbPath: string, options: { familyId?: string; onProgress?: (done: number, total: number) => void } = {}): VerifyReport {
  const startMs = Date.now();
  const reader = openCatalogForRead(dbPath);
  try {
    const systems = new Map(reader.systems().map((s) => [s.id, s]));
    const runs = new Map<number, RunRow>(reader.runs().map((r) => [r.id, r]));
    const families = options.familyId === undefined ? reader.families() : [reader.family(options.familyId)];
    if (options.familyId !== undefined && families[0] === undefined) throw new RangeError(`family "${options.familyId}" is not in ${dbPath}`);
    const total = families.reduce((sum, f) => sum + (f?.memberCount ?? 0), 0);
    const report: VerifyReport = { orbitsChecked: 0, failures: [], worstClosure: 0, worstDrift: 0, seconds: 0 };
    for (const family of families) {
      if (family === undefined) continue;
      const system = systems.get(family.systemId)!;
      const run = runs.get(family.runId)!;
      const tolerance = verifyToleranceFor(run);
      for (const orbit of reader.orbits(family.id)) {
        const check = recheckOrbit(system.mu, system.timeUnitS, orbit, run, tolerance);
        report.orbitsChecked += 1;
        report.worstClosure = Math.max(report.worstClosure, check.closureError);
        report.worstDrift = Math.max(report.worstDrift, check.jacobiDrift);
        // NaN (a failed integration) counts as a failure too.
        const closes = check.closureError <= check.limits.closure && check.jacobiDrift <= check.limits.jacobiDrift;
        if (!closes || check.disagreements.length > 0) report.failures.push({ orbitId: orbit.id, ...check });
        options.onProgress?.(report.orbitsChecked, total);
      }
    }
    report.seconds = (Date.now() - startMs) / 1000;
    return report;
  } finally {
    reader.close();
  }
}
