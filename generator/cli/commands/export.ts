// `cycler-atlas export --db FILE --format json|csv [--family ID] [--out FILE]`: the whole catalog (or
// one family) as JSON or CSV, written to a file or to standard output.
import { writeFileSync } from 'node:fs';
import { Command } from 'commander';
import { exportCatalogCsv, exportCatalogJson } from '../../../catalog-db/export-catalog.ts';
import { openCatalogForRead } from '../../../catalog-db/open-catalog.ts';
import { exitWithUsageCode, failWith } from '../command-exit.ts';
import { UsageError } from '../../errors/usage-error.ts';
import { assertOutputIsNotInput, assertReadableCatalogPath } from '../../run/path-options.ts';

const DEFAULT_DB_PATH = 'catalog-db/demo.sqlite';
const FORMATS = ['json', 'csv'] as const;

export function createExportCommand(): Command {
  const command = new Command('export')
    .description('write the catalog (or one family) as JSON or CSV')
    .option('--db <file>', 'catalog file to read', DEFAULT_DB_PATH)
    .option('--format <format>', `output format: ${FORMATS.join(', ')}`, 'json')
    .option('--family <id>', 'only this family, e.g. earth-moon/E2M1/a')
    .option('--out <file>', 'output file (default: standard output)')
    .action((flags: { db: string; format: string; family?: string; out?: string }) => {
      try {
        if (!(FORMATS as readonly string[]).includes(flags.format)) {
          throw new UsageError(`--format: "${flags.format}" is not allowed (allowed: ${FORMATS.join(', ')})`);
        }
        assertReadableCatalogPath('--db', flags.db);
        if (flags.out !== undefined) assertOutputIsNotInput('--out', flags.out, [['--db', flags.db]]);
        const reader = openCatalogForRead(flags.db);
        let text: string;
        try {
          if (flags.family !== undefined && reader.family(flags.family) === undefined) {
            throw new UsageError(`--family: "${flags.family}" is not in ${flags.db} (see the familyId column of --format csv)`);
          }
          const options = { familyId: flags.family };
          text = flags.format === 'json' ? `${JSON.stringify(exportCatalogJson(reader, options), null, 2)}\n` : exportCatalogCsv(reader, options);
        } finally {
          reader.close();
        }
        if (flags.out === undefined) process.stdout.write(text);
        else {
          writeFileSync(flags.out, text);
          console.error(`wrote ${flags.out} (${flags.format}, ${text.length} characters)`);
        }
      } catch (error) {
        failWith(command, error);
      }
    });
  return exitWithUsageCode(command);
}
