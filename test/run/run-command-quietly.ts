// runCommand with the command's console output captured instead of printed: console.log lines are
// returned, console.error and standard-output writes are dropped.
import { vi } from 'vitest';
import { runCommand } from './run-command.ts';

export async function runCommandQuietly(create: Parameters<typeof runCommand>[0], args: string[]) {
  const printed: string[] = [];
  const log = vi.spyOn(console, 'log').mockImplementation((line: unknown) => { printed.push(String(line)); });
  const error = vi.spyOn(console, 'error').mockImplementation(() => {});
  const write = vi.spyOn(process.stdout, 'write').mockImplementation(() => true);
  try {
    return { ...(await runCommand(create, args)), printed };
  } finally {
    log.mockRestore();
    error.mockRestore();
    write.mockRestore();
  }
}
