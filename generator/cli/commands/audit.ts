// `cycler-atlas audit --db FILE [--levels N] [--seed S] [--grid-factor F] [--workers N]`: the completeness audit. At N random Jacobi
// levels per system (seeded; the seed is printed so that the audit can be repeated) that discovery did
// not use, every segment, direction and crossing count of each lap-signature job is scanned afresh; each
// symmetric orbit found with the job's signature and an L1 passage must lie on a catalogued family of
// the job. Prints those that do not, with their states. Exit 0 none, 1 some, 2 bad arguments, 130 Ctrl-C.
import { Command } from 'commander';
import type { AuditMiss } from '../../../catalog-db/audit-types.ts';
import { auditCatalog, DEFAULT_GRID_FACTOR } from '../../run/audit-catalog.ts';
import { exitWithUsageCode, failWith } from '../command-exit.ts';
import { parseIntegerOption } from '../../run/command-line-values.ts';
import { handleInterrupts, INTERRUPTED_EXIT_CODE } from '../../run/interrupt-handler.ts';
import { assertReadableCatalogPath, assertWritableCatalogPath } from '../../run/path-options.ts';
import { defaultWorkerCount } from '../../run/worker-pool.ts';

const DEFAULT_DB_PATH = 'catalog-db/demo.sqlite';
export const DEFAULT_AUDIT_LEVELS = 6;
const MAX_AUDIT_LEVELS = 1000;
const MAX_SEED = 2 ** 32 - 1;
const MAX_GRID_FACTOR = 64;

const formatState = (state: readonly number[]) => `[${state.map((v) => (v === 0 ? '0' : v.toPrecision(15))).join(', ')}]`;

export function formatMiss(miss: AuditMiss): string {
  return `  ${miss.jobKey} (${miss.signature}): not on any family: C ${miss.jacobi.toFixed(10)}, period ${miss.periodNd.toFixed(8)} TU, ` +
    `state0 ${formatState(miss.state0)}, x at T/2 ${miss.xHalf.toPrecision(12)} ` +
    `(found on ${miss.segment}, ẏ0 ${miss.direction > 0 ? '> 0' : '< 0'}, half period at crossing ${miss.halfCrossings})`;
}

export function createAuditCommand(): Command {
  const command = new Command('audit')
    .description('check completeness: scan random Jacobi levels discovery did not use and list symmetric orbits on no catalogued family')
    .option('--db <file>', 'catalog file to audit (the audit is stored in it)', DEFAULT_DB_PATH)
    .option('--levels <n>', `random Jacobi levels per system (default ${DEFAULT_AUDIT_LEVELS})`)
    .option('--grid-factor <f>', `scan with f times each job's start points per segment (default ${DEFAULT_GRID_FACTOR})`)
    .option('--workers <n>', 'worker threads for the scans (default: one per core)')
    .option('--seed <s>', 'seed of the level draw, to repeat an audit (default: from the clock, printed)')
    .action(async (flags: { db: string; levels?: string; seed?: string; gridFactor?: string; workers?: string }) => {
      try {
        const levelsPerSystem = flags.levels === undefined ? DEFAULT_AUDIT_LEVELS : parseIntegerOption('--levels', flags.levels, 1, MAX_AUDIT_LEVELS);
        const seed = flags.seed === undefined ? Date.now() % (MAX_SEED + 1) : parseIntegerOption('--seed', flags.seed, 0, MAX_SEED);
        const gridFactor = flags.gridFactor === undefined ? DEFAULT_GRID_FACTOR : parseIntegerOption('--grid-factor', flags.gridFactor, 1, MAX_GRID_FACTOR);
        const workers = flags.workers === undefined ? defaultWorkerCount() : parseIntegerOption('--workers', flags.workers, 1, 256);
        assertReadableCatalogPath('--db', flags.db);
        assertWritableCatalogPath('--db', flags.db); // the audit is stored in it
        console.log(`audit of ${flags.db}: ${levelsPerSystem} level(s) per system, ${gridFactor}× each job's scan grid, seed ${seed} (repeat with --seed ${seed})`);
        let stop = false;
        const removeHandler = handleInterrupts(() => (stop = true), (line) => process.stderr.write(`${line}\n`));
        const report = await (async () => {
          try {
            return await auditCatalog({ dbPath: flags.db, levelsPerSystem, seed, gridFactor, workers, shouldStop: () => stop });
          } finally {
            removeHandler();
          }
        })();
        for (const [systemId, levels] of Object.entries(report.levels)) {
          console.log(`  ${systemId} levels: ${levels.map((c) => c.toFixed(8)).join(', ')}`);
        }
        if (report.interrupted) {
          console.log(`audit interrupted after ${report.seconds.toFixed(1)} s (${report.orbitsChecked} orbits checked); nothing stored`);
          process.exitCode = INTERRUPTED_EXIT_CODE;
          return;
        }
        console.log(
          `audited ${report.jobsAudited} lap-signature job(s): ${report.orbitsChecked} orbits checked, ${report.misses.length} on no catalogued family ` +
            `(${report.seconds.toFixed(1)} s; stored as audit ${report.auditId})`,
        );
        for (const miss of report.misses) console.log(formatMiss(miss));
        process.exitCode = report.misses.length > 0 ? 1 : 0;
      } catch (error) {
        failWith(command, error);
      }
    });
  return exitWithUsageCode(command);
}
