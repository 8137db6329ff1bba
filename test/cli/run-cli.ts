// Runs the real `cycler-atlas` binary (bin/cycler-atlas.mjs) in a child process.
import { execFile } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const BIN = fileURLToPath(new URL('../../bin/cycler-atlas.mjs', import.meta.url));
const ROOT = fileURLToPath(new URL('../..', import.meta.url));

export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
}

export function runCli(args: string[]): Promise<CliRun> {
  return new Promise((resolve) => {
    execFile(process.execPath, [BIN, ...args], { cwd: ROOT, maxBuffer: 64 * 1024 * 1024 }, (error, stdout, stderr) => {
      const code = error ? (typeof error.code === 'number' ? error.code : 1) : 0;
      resolve({ code, stdout, stderr });
    });
  });
}
