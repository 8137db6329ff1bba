// After a run's jobs: each family end where the lap signature changes is linked to the catalogued family
// its next orbit lies on (core/orbits/family-holding.ts). Where no family holds that orbit and this run
// has a done job for its signature, that job follows the orbit once as a family of its own (on a worker
// thread, so that Ctrl-C is heard), and the link goes to the new family. Up to MAX_ROUNDS rounds, so a
// chain of hand-offs (a new family whose own signature changes) is followed too.
import { openCatalogForRead } from '../../catalog-db/open-catalog.ts';
import type { CatalogWriter, FamilyRow, SignatureChangeRow } from '../../catalog-db/types.ts';
import { storedOrbitFootprint, type StoredFootprint } from '../core/orbits/audit-footprint.ts';
import type { FamilyJob } from '../core/orbits/family-job.ts';
import { familyHolding } from '../core/orbits/family-holding.ts';
import type { Tolerance } from '../core/propagation/tolerance.ts';
import { createRateProgress } from './rate-progress.ts';
import { storedFamiliesOfJob } from './stored-families-of-job.ts';
import type { FamilyPool } from './worker-pool.ts';
import { createJobWriter } from './write-job-result.ts';

export interface LinkOptions {
  dbPath: string;
  writer: CatalogWriter;
  runId: number;
  /** Jobs that may follow hand-offs (this run's); none: links are only looked up. */
  jobs: readonly FamilyJob[];
  log: (line: string) => void;
  shouldStop?: () => boolean;
  /** Runs the follow-up jobs (created on first need when absent, and then destroyed here). */
  pool: () => FamilyPool;
}

export interface LinkSummary {
  linked: number;
  /** Hand-offs followed by a job, and the families they gave. */
  followed: number;
  familiesWritten: number;
  membersWritten: number;
  /** Signature changes still without a family (their signature has no job here, or the follow-up found none). */
  unlinked: number;
  interrupted: boolean;
}

const MAX_ROUNDS = 3;
const DEFAULT_TOLERANCE: Tolerance = { rtol: 1e-12, atol: 1e-12 };

interface CatalogView {
  families: FamilyRow[];
  mu: Map<string, number>;
  pending: SignatureChangeRow[];
}

function readView(dbPath: string): CatalogView {
  const reader = openCatalogForRead(dbPath);
  try {
    return {
      families: reader.families(),
      mu: new Map(reader.systems().map((s) => [s.id, s.mu])),
      pending: reader.signatureChanges().filter((c) => c.intoFamilyId === null),
    };
  } finally {
    reader.close();
  }
}

export async function linkSignatureChanges(options: LinkOptions): Promise<LinkSummary> {
  const summary: LinkSummary = { linked: 0, followed: 0, familiesWritten: 0, membersWritten: 0, unlinked: 0, interrupted: false };
  const toleranceOf = (configKey: string) => options.jobs.find((j) => j.key === configKey)?.tolerance ?? options.jobs[0]?.tolerance ?? DEFAULT_TOLERANCE;
  // One half-period propagation per stored member, once per family and pass.
  const footprints = new Map<string, StoredFootprint[]>();
  for (let round = 0; round < MAX_ROUNDS; round++) {
    const view = readView(options.dbPath);
    if (view.pending.length === 0) break;
    const familyById = new Map(view.families.map((f) => [f.id, f]));
    /** The families a change may continue into: its own system's, of its new signature. */
    const targetsOf = (change: SignatureChangeRow) => {
      const source = familyById.get(change.familyId)!;
      return view.families.filter((f) => f.systemId === source.systemId && f.signature === change.signature);
    };
    const unmeasured = [...new Set(view.pending.flatMap(targetsOf))].filter((f) => !footprints.has(f.id));
    const progress = createRateProgress('signature changes: stored members measured', unmeasured.reduce((n, f) => n + f.memberCount, 0), options.log);
    let measured = 0;
    const reader = openCatalogForRead(options.dbPath);
    try {
      for (const family of unmeasured) {
        if (options.shouldStop?.()) return { ...summary, interrupted: true };
        const mu = view.mu.get(family.systemId)!;
        footprints.set(family.id, reader.orbits(family.id).map((o) => storedOrbitFootprint(mu, o.state0, o.period, toleranceOf(family.configKey))));
        measured += family.memberCount;
        progress.step(measured, family.id);
      }
    } finally {
      reader.close();
    }
    const handoffs = new Map<FamilyJob, SignatureChangeRow[]>();
    for (const change of view.pending) {
      const source = familyById.get(change.familyId)!;
      const mu = view.mu.get(source.systemId)!;
      const orbit = storedOrbitFootprint(mu, change.state0, change.period, toleranceOf(source.configKey));
      const candidates = targetsOf(change).map((f) => ({ id: f.id, members: footprints.get(f.id)! }));
      const into = familyHolding(orbit, candidates);
      if (into !== null) {
        options.writer.linkSignatureChange(change.familyId, change.side, { intoFamilyId: into, followedUp: change.followedUp });
        summary.linked++;
        continue;
      }
      if (change.followedUp) continue;
      const job = options.jobs.find((j) => j.seed.kind === 'lap-signature' && j.system.id === source.systemId
        && j.seed.signature === change.signature && options.writer.jobDone(j.key));
      if (job) handoffs.set(job, [...(handoffs.get(job) ?? []), change]);
    }
    if (handoffs.size === 0) break;
    for (const [job, changes] of handoffs) {
      if (options.shouldStop?.()) return { ...summary, interrupted: true };
      options.log(`signature changes: ${job.key} follows ${changes.length} hand-off(s) from ${changes.map((c) => `${c.familyId} (${c.side})`).join(', ')}`);
      const jobWriter = createJobWriter(options.writer, options.runId, job);
      const reader = openCatalogForRead(options.dbPath);
      let stored;
      try {
        stored = storedFamiliesOfJob(reader, job.key);
      } finally {
        reader.close();
      }
      const result = await options.pool().run(job, { onProgress: () => {}, onFamily: (bundle) => jobWriter.family(bundle) }, {
        stored, handoffs: changes.map((c) => ({ state0: c.state0, periodNd: c.period })),
      });
      const written = jobWriter.finish(result);
      summary.familiesWritten += written.families;
      summary.membersWritten += written.members;
      if (result.interrupted) return { ...summary, interrupted: true };
      // Tried once: the next round links them to what was found (or leaves them without a family).
      for (const c of changes) options.writer.linkSignatureChange(c.familyId, c.side, { intoFamilyId: null, followedUp: true });
      summary.followed += changes.length;
    }
  }
  summary.unlinked = readView(options.dbPath).pending.length;
  return summary;
}
