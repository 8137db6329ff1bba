// Writes what a job yields: each finished family in its own transaction as soon as the worker has it,
// then, when the whole job has finished, its done mark. A job stopped part-way keeps the families it
// finished and is not marked done: resume runs it again after them (stored-families-of-job.ts).
import type { CatalogWriter, FamilyBundle } from '../../catalog-db/types.ts';
import type { FamilyJob, JobResult } from '../core/orbits/family-job.ts';

export interface WrittenJob {
  families: number;
  members: number;
  done: boolean;
}

export interface JobWriter {
  /** Writes one finished family now (a family already written by id is not written again). */
  family(bundle: FamilyBundle): void;
  /** Writes any family of the result not yet written, then marks the job done unless it was interrupted. */
  finish(result: JobResult): WrittenJob;
}

export function createJobWriter(writer: CatalogWriter, runId: number, job: FamilyJob): JobWriter {
  const written = new Set<string>();
  let members = 0;
  const family = (bundle: FamilyBundle) => {
    if (written.has(bundle.family.id)) return;
    writer.writeFamily({ ...bundle, family: { ...bundle.family, runId } });
    written.add(bundle.family.id);
    members += bundle.orbits.length;
  };
  return {
    family,
    finish(result) {
      // The result repeats every family: one whose message had not arrived yet is written here.
      for (const bundle of result.bundles) family(bundle);
      if (!result.interrupted) writer.markJobDone(job, runId);
      return { families: written.size, members, done: !result.interrupted };
    },
  };
}
