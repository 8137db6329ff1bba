// Wall-clock time of the whole demo catalog (catalogs/demo.yaml) with 1 and with 2 worker threads,
// and the speed-up. Each run writes a fresh catalog in a temporary directory. The figures include
// worker start-up (tsx compiling the numerical core in each thread) and the SQLite writes.
// Also printed: CPU seconds of the process (all threads), which a busy machine inflates less than
// wall time, and the longest single job, which bounds the speed-up: jobs are not split across workers.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { generateCatalog } from '../generator/run/generate-catalog.ts';

const CONFIG_PATH = fileURLToPath(new URL('../catalogs/demo.yaml', import.meta.url));
const WORKER_COUNTS = [1, 2];

export async function run(): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'cycler-atlas-bench-'));
  try {
    const seconds = new Map<number, number>();
    for (const workers of WORKER_COUNTS) {
      const cpuBefore = process.cpuUsage();
      const summary = await generateCatalog({
        configPath: CONFIG_PATH,
        dbPath: join(dir, `demo-${workers}.sqlite`),
        workers,
        progress: 'lines',
        handleSigint: false,
        log: () => {},
      });
      const cpu = process.cpuUsage(cpuBefore);
      const cpuSeconds = (cpu.user + cpu.system) / 1e6;
      seconds.set(workers, summary.seconds);
      const [longestKey, longestSeconds] = Object.entries(summary.jobSeconds).sort((a, b) => b[1] - a[1])[0] ?? ['-', 0];
      console.log(
        `demo catalog, ${workers} worker(s): ${summary.seconds.toFixed(1)} s wall, ${cpuSeconds.toFixed(1)} s CPU ` +
          `(${summary.jobsDone} jobs, ${summary.familiesWritten} families, ${summary.membersWritten} members, ` +
          `${(summary.membersWritten / summary.seconds).toFixed(1)} members/s; longest job ${longestKey} ${longestSeconds.toFixed(1)} s` +
          `${summary.jobsFailed.length ? `; ${summary.jobsFailed.length} failed` : ''})`,
      );
    }
    const one = seconds.get(1)!;
    const two = seconds.get(2)!;
    console.log(`speed-up with 2 workers: ${(one / two).toFixed(2)}x`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
