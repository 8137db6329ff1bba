// `cycler-atlas merge OUT IN...`: merges shard catalogs (from `generate --shard k/n`) into OUT
// (created if missing). The rules for families present twice are catalog-db/merge-catalogs.ts's.
import { Command } from 'commander';
import { MergeRefusedError, mergeCatalogs } from '../../../catalog-db/merge-catalogs.ts';
import { exitWithUsageCode, failWith } from '../command-exit.ts';
import { UsageError } from '../../errors/usage-error.ts';
import { lockCatalogNow } from '../../run/catalog-lock.ts';
import { assertOutputIsNotInput, assertReadableCatalogPath, assertWritableCatalogPath } from '../../run/path-options.ts';

export function createMergeCommand(): Command {
  const command = new Command('merge')
    .description('merge shard catalogs into one catalog file')
    .argument('<out>', 'catalog file to write (created if missing)')
    .argument('<in...>', 'catalog files to merge into it')
    .action((out: string, inputs: string[]) => {
      try {
        for (const input of inputs) assertReadableCatalogPath('IN', input);
        assertWritableCatalogPath('OUT', out);
        assertOutputIsNotInput('OUT', out, inputs.map((input) => ['IN', input] as const));
        const release = lockCatalogNow('OUT', out);
        let report: ReturnType<typeof mergeCatalogs>;
        try {
          report = mergeCatalogs(out, inputs);
        } finally {
          release();
        }
        for (const input of report.inputs) {
          console.log(
            `merged ${input.path}: ${input.familiesWritten} families written, ${input.familiesSkipped} kept from newer runs, ` +
              `${input.runsAdded} runs added, ${input.jobsMerged} jobs`,
          );
        }
        console.log(`wrote ${report.outPath}`);
      } catch (error) {
        // Inputs that do not belong together are bad input (exit 2), like a bad argument.
        failWith(command, error instanceof MergeRefusedError ? new UsageError(error.message) : error);
      }
    });
  return exitWithUsageCode(command);
}
