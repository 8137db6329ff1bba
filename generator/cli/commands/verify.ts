// `cycler-atlas verify --db FILE [--family ID]`: re-integrates every stored orbit with its monodromy over
// one period and reports those whose closure error or Jacobi drift exceeds the limits of
// generator/run/verify-limits.ts (at the usual tolerance 1e-12: closure 1e-8 times the largest eigenvalue
// modulus λ of the re-integrated monodromy, drift 1e-9), or whose stored Jacobi constant, period or
// stability indices disagree with the re-integration. Exit 1 if any does, 2 on bad arguments.
import { Command } from 'commander';
import { exitWithUsageCode, failWith } from '../command-exit.ts';
import { UsageError } from '../../errors/usage-error.ts';
import { assertReadableCatalogPath } from '../../run/path-options.ts';
import { verifyCatalog } from '../../run/verify-catalog.ts';

const DEFAULT_DB_PATH = 'catalog-db/demo.sqlite';
const FAILURES_SHOWN = 20;
const formatNumber = (value: number) => value.toExponential(2);

export function createVerifyCommand(): Command {
  const command = new Command('verify')
    .description('re-integrate every stored orbit with its monodromy over one period; check closure, Jacobi drift and the stored values')
    .option('--db <file>', 'catalog file to check', DEFAULT_DB_PATH)
    .option('--family <id>', 'check only this family')
    .action((flags: { db: string; family?: string }) => {
      try {
        assertReadableCatalogPath('--db', flags.db);
        const report = verifyCatalog(flags.db, { familyId: flags.family });
        console.log(
          `verified ${report.orbitsChecked} orbits in ${report.seconds.toFixed(1)} s: worst closure error ${formatNumber(report.worstClosure)}, ` +
            `worst Jacobi drift ${formatNumber(report.worstDrift)}; ${report.failures.length} over the limits`,
        );
        for (const f of report.failures.slice(0, FAILURES_SHOWN)) {
          console.log(
            `  ${f.orbitId}: closure ${formatNumber(f.closureError)} (limit ${formatNumber(f.limits.closure)} with λ ${formatNumber(f.largestEigenvalueModulus)}), ` +
              `drift ${formatNumber(f.jacobiDrift)} (limit ${formatNumber(f.limits.jacobiDrift)})` +
              f.disagreements.map((d) => `; ${d}`).join(''),
          );
        }
        if (report.failures.length > FAILURES_SHOWN) console.log(`  ... and ${report.failures.length - FAILURES_SHOWN} more`);
        process.exitCode = report.failures.length > 0 ? 1 : 0;
      } catch (error) {
        failWith(command, error instanceof RangeError ? new UsageError(`--family: ${error.message}`) : error);
      }
    });
  return exitWithUsageCode(command);
}
