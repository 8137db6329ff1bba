// How the generator's commands end on errors: bad arguments and configs exit 2 with their one-line
// message, failures while working exit 1. Shared by generate, verify, export and merge.
import type { Command, CommanderError } from 'commander';
import { ConfigError } from '../config/validate-config.ts';
import { UsageError, USAGE_EXIT_CODE } from '../errors/usage-error.ts';

export function failWith(command: Command, error: unknown): never {
  const message = error instanceof Error ? error.message : String(error);
  const usage = error instanceof UsageError || error instanceof ConfigError;
  command.error(message, { exitCode: usage ? USAGE_EXIT_CODE : 1, code: usage ? 'cycler-atlas.usage' : 'cycler-atlas.failure' });
}

/** Commander's own parse errors (unknown option, missing value, ...) exit 2 like ours. */
export function exitWithUsageCode(command: Command): Command {
  return command.exitOverride((error: CommanderError) => {
    const commanderUsage = error.code.startsWith('commander.') && error.exitCode !== 0;
    process.exit(commanderUsage ? USAGE_EXIT_CODE : error.exitCode);
  });
}
