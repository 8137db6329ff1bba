// Time of the completeness audit (`cycler-atlas audit`, 6 levels, 4× the jobs' scan grid) on two small
// catalogs built first in a temporary directory (their generation is not counted): the audit tests'
// catalog (one E1M1 family over a narrow C range) and the one-signature catalog of E2M1 with built-in
// settings (`generate --system earth-moon --signature E2M1`), with 1 and 2 worker threads (the second
// figure includes starting the workers). Also printed: scans per second and the
// orbits checked and missed (E2M1's misses are families discovery did not find, issue 8).
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { singleFamilyConfig } from '../generator/config/single-family-config.ts';
import { auditCatalog } from '../generator/run/audit-catalog.ts';
import { generateCatalog, generateFromConfig } from '../generator/run/generate-catalog.ts';

const SMALL_CONFIG = fileURLToPath(new URL('../test/run/fixtures/audit-catalog.yaml', import.meta.url));
const LEVELS = 6;
const SEED = 20261202;
const WORKER_COUNTS = [1, 2];
const quiet = { workers: 2, progress: 'lines' as const, handleSigint: false, log: () => {} };

async function timeAudit(label: string, dbPath: string, workers: number): Promise<void> {
  let scans = 0;
  const report = await auditCatalog({
    dbPath, levelsPerSystem: LEVELS, seed: SEED, workers,
    log: (line) => {
      const match = /scans [^:]*: (\d+)\//.exec(line);
      if (match) scans = Number(match[1]);
    },
  });
  console.log(
    `audit, ${label}, ${workers} worker(s): ${report.seconds.toFixed(1)} s (${scans} scans, ${(scans / report.seconds).toFixed(2)} scans/s; ` +
      `${report.orbitsChecked} orbits checked, ${report.misses.length} missed; ${LEVELS} levels, seed ${SEED})`,
  );
}

export async function run(): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'cycler-atlas-bench-audit-'));
  try {
    const small = join(dir, 'small.sqlite');
    await generateCatalog({ ...quiet, configPath: SMALL_CONFIG, dbPath: small });
    for (const workers of WORKER_COUNTS) await timeAudit('test catalog (E1M1 over C 3.036–3.05, L1 Lyapunov)', small, workers);
    const e2m1 = join(dir, 'e2m1.sqlite');
    await generateFromConfig(singleFamilyConfig({ system: 'earth-moon', signature: 'E2M1' }), { ...quiet, dbPath: e2m1, scenario: 'if-missing' });
    for (const workers of WORKER_COUNTS) await timeAudit('one-signature catalog E2M1 (built-in settings)', e2m1, workers);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
