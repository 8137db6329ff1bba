// Writes what one job yielded, one family per transaction. The last family of a complete job marks
// the job done in the same transaction; an interrupted job is written but left not done (resume
// runs it again and replaces its families by id).
import type { CatalogWriter } from '../../catalog-db/types.ts';
import type { FamilyJob, JobResult } from '../core/orbits/family-job.ts';

export interface WrittenJob {
  families: number;
  members: number;
  done: boolean;
}

export function writeJobResult(writer: CatalogWriter, runId: number, job: FamilyJob, result: JobResult): WrittenJob {
  const { bundles, interrupted } = result;
  let members = 0;
  bundles.forEach((bundle, index) => {
    const completes = !interrupted && index === bundles.length - 1 ? job : undefined;
    writer.writeFamily({ ...bundle, family: { ...bundle.family, runId } }, completes);
    members += bundle.orbits.length;
  });
  if (!interrupted && bundles.length === 0) writer.markJobDone(job, runId);
  return { families: bundles.length, members, done: !interrupted };
}
