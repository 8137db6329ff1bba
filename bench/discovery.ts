// Discovery and continuation with the built-in settings (Earth–Moon, rtol = atol = 1e-12):
//  1. the discovery grid of one segment and direction (far side of the Earth, ẏ < 0): grid points per
//     second, and the root edges it gives;
//  2. one lap-signature job (E1M1, hold-radius and model screenings off) on the shared grids: seeds
//     tried per family written, members per second of its continuation and window location.
// A busy machine inflates every figure; run it alone.
import { buildJobs } from '../generator/config/build-jobs.ts';
import { singleFamilyConfig } from '../generator/config/single-family-config.ts';
import { discoverCandidates } from '../generator/core/orbits/discovery/discover-candidates.ts';
import { jobDiscoveryRequests } from '../generator/core/orbits/discovery/job-discovery-requests.ts';
import { runFamilyJob } from '../generator/core/orbits/run-family-job.ts';

export async function run(): Promise<void> {
  const loaded = singleFamilyConfig({ system: 'earth-moon', signature: 'E1M1' });
  const job = { ...buildJobs(loaded.config, loaded.configPath)[0]!, screening: undefined };
  const requests = jobDiscoveryRequests(job);
  const one = requests.find((r) => r.segment === 'far-primary' && r.direction === -1)!;
  let start = performance.now();
  const grid = discoverCandidates(one);
  let seconds = (performance.now() - start) / 1000;
  console.log(
    `discovery grid (${one.gridPoints} start points × ${one.levels.length} levels, K = ${one.maxHalfCrossings}, far-primary, ẏ < 0): ` +
      `${seconds.toFixed(1)} s, ${(grid.gridPoints / seconds).toFixed(0)} grid points/s, ${grid.candidates.length} root edges`,
  );
  start = performance.now();
  const discovered = requests.map((r) => discoverCandidates(r));
  const gridSeconds = (performance.now() - start) / 1000;
  const points = discovered.reduce((sum, d) => sum + d.gridPoints, 0);
  console.log(`all ${requests.length} grids of Earth–Moon: ${gridSeconds.toFixed(1)} s on one thread, ${(points / gridSeconds).toFixed(0)} grid points/s`);
  start = performance.now();
  const result = runFamilyJob(job, {}, { discovered });
  seconds = (performance.now() - start) / 1000;
  const members = result.bundles.reduce((sum, b) => sum + b.orbits.length, 0);
  const s = result.seedSearch!;
  console.log(
    `E1M1 job on them: ${result.bundles.length} families, ${members} members in ${seconds.toFixed(1)} s (${(members / seconds).toFixed(1)} members/s); ` +
      `${s.candidates} root edges of the signature, ${s.covered} on continued families, ${s.tried} tried ` +
      `(${(s.tried / Math.max(1, result.bundles.length)).toFixed(1)} seeds per family)`,
  );
}
