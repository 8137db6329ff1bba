// Optional speed reference: builds bench/gsl/hnw-rk8pd.c against GSL (libgsl-dev) in a temporary folder and
// runs it. Skipped, with a note, when the GSL headers or a C compiler are missing. Never part of the product.
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

export interface GslFigure {
  label: string;
  n: number;
  rhsEvaluations: number;
  medianMicros: number;
  minMicros: number;
  closure: number;
}

const SOURCE = fileURLToPath(new URL('./hnw-rk8pd.c', import.meta.url));

/** Returns null (and says why) when GSL cannot be built here. */
export function runGslReference(): GslFigure[] | null {
  if (!existsSync('/usr/include/gsl/gsl_odeiv2.h')) {
    console.log('GSL reference skipped: libgsl-dev is not installed');
    return null;
  }
  const dir = mkdtempSync(join(tmpdir(), 'cycler-atlas-gsl-'));
  try {
    const binary = join(dir, 'hnw-rk8pd');
    try {
      execFileSync('cc', ['-O2', '-o', binary, SOURCE, '-lgsl', '-lgslcblas', '-lm'], { stdio: 'pipe' });
    } catch (error) {
      console.log(`GSL reference skipped: cannot compile (${(error as Error).message.split('\n')[0]})`);
      return null;
    }
    const output = execFileSync(binary, { encoding: 'utf8' });
    return output.trim().split('\n').map((line) => {
      const [label, n, calls, median, min, closure] = line.split(' ');
      return {
        label, n: Number(n), rhsEvaluations: Number(calls), medianMicros: Number(median), minMicros: Number(min),
        closure: Number(closure),
      };
    });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
