import type { Command } from 'commander';

/** Error lines start with "cycler-atlas: " (commander's own "error: " is dropped), so every failure reads alike. */
export function withErrorPrefix(command: Command): Command {
  return command.configureOutput({
    outputError: (text, write) => write(`cycler-atlas: ${text.replace(/^error: /, '')}`),
  });
}
