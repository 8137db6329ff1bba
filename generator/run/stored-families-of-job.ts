// The finished families a stopped run already wrote for a job, in id order (their letters), as the job
// reads them to go on after them.
import type { CatalogReader } from '../../catalog-db/types.ts';
import type { StoredFamily } from '../core/orbits/stored-family-trace.ts';

export function storedFamiliesOfJob(reader: CatalogReader, jobKey: string): StoredFamily[] {
  return reader.families()
    .filter((family) => family.configKey === jobKey)
    // Letters run a…z, aa, ab…: shorter ids first, then alphabetical.
    .sort((a, b) => a.id.length - b.id.length || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0))
    .map((family) => ({ id: family.id, members: reader.orbits(family.id).map((o) => ({ state0: o.state0, periodNd: o.period })) }));
}
