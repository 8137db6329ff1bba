// Runs one of the generator's commands in this process, as the CLI would, and captures what it
// writes to stderr and the exit code (process.exit is intercepted; commander's own errors go
// through the command's exitOverride, which calls process.exit).
import type { Command } from 'commander';
import { vi } from 'vitest';

class ExitCalled extends Error {
  constructor(readonly code: number) {
    super(`process.exit(${code})`);
  }
}

export async function runCommand(create: () => Command, args: string[]): Promise<{ code: number; stderr: string }> {
  let stderr = '';
  const command = create().configureOutput({ writeErr: (text) => { stderr += text; }, writeOut: () => {} });
  const exit = vi.spyOn(process, 'exit').mockImplementation(((code?: number) => {
    throw new ExitCalled(code ?? 0);
  }) as never);
  const before = process.exitCode;
  try {
    await command.parseAsync(args, { from: 'user' });
    return { code: Number(process.exitCode ?? 0), stderr };
  } catch (error) {
    if (error instanceof ExitCalled) return { code: error.code, stderr };
    throw error;
  } finally {
    exit.mockRestore();
    process.exitCode = before;
  }
}
