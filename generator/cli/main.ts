// The `cycler-atlas` command (bin/cycler-atlas.mjs loads this file through tsx).
// One file per command in commands/; add a command by adding its factory to COMMANDS.
import { Command } from 'commander';
import { exitWithUsageCode } from './command-exit.ts';
import { createAuditCommand } from './commands/audit.ts';
import { createExportCommand } from './commands/export.ts';
import { createExportStateCommand } from './commands/export-state.ts';
import { createGenerateCommand } from './commands/generate.ts';
import { createMergeCommand } from './commands/merge.ts';
import { createPropagateCommand } from './commands/propagate.ts';
import { createVerifyCommand } from './commands/verify.ts';
import { withErrorPrefix } from './error-prefix.ts';

const COMMANDS: Array<() => Command> = [
  createGenerateCommand,
  createVerifyCommand,
  createAuditCommand,
  createExportCommand,
  createMergeCommand,
  createPropagateCommand,
  createExportStateCommand,
];

const program = new Command('cycler-atlas')
  .description('periodic orbits of the circular restricted three-body problem: generate, check, export and propagate')
  .showHelpAfterError(false);
for (const create of COMMANDS) program.addCommand(withErrorPrefix(create()));
await exitWithUsageCode(withErrorPrefix(program)).parseAsync(process.argv);
