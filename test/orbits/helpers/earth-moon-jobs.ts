// The two small jobs the orbit tests share: the L1 Lyapunov family (41 members) and one E1M1 cycler family
// seeded from the far side of the Earth (ẏ < 0), scanned at two Jacobi constants of the same family (for
// the dedup check). A job's result is computed once per worker and kept in the OS temp folder under a key made
// of the job and the full text of generator/core, so that the other test files (and later runs with unchanged
// numerics) read it instead of recomputing; any change to the core's source makes a new key.
import { createHash } from 'node:crypto';
import { mkdirSync, readFileSync, readdirSync, renameSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { resolveSystem } from '../../../generator/config/resolve-system.ts';
import type { FamilyJob, JobInputs, JobResult, SystemSpec } from '../../../generator/core/orbits/family-job.ts';
import { runFamilyJob } from '../../../generator/core/orbits/run-family-job.ts';
import { lagrangePoints } from '../../../generator/core/cr3bp/lagrange-points.ts';

export const EARTH_MOON: SystemSpec = resolveSystem({ preset: 'earth-moon' });

const LIMITS = {
  jacobiMin: 2.9, jacobiMax: 3.3, maxPeriodNd: 40, unstableStop: { indexAbove: 1e5, members: 40 },
  initialStepNd: 1e-3, maxStepNd: 0.05,
};

export const LYAPUNOV_JOB: FamilyJob = {
  key: 'test:L1-Lyapunov', name: 'L1 Lyapunov (test)', system: EARTH_MOON,
  seed: { kind: 'lyapunov', point: 'L1', amplitudeNd: 1e-3 },
  limits: { ...LIMITS, maxMembers: 41 },
  tolerance: { rtol: 1e-12, atol: 1e-12 }, indexTolerance: 1e-6,
};

/** Jacobi constants of the two scans; both lie on the same E1M1 family (C ≈ 3.0315 … 3.0516). */
export const E1M1_SCAN_JACOBI = [3.046, 3.05];

export const E1M1_JOB: FamilyJob = {
  key: 'test:E1M1', name: 'E1M1 (test)', system: EARTH_MOON,
  seed: {
    kind: 'lap-signature', signature: 'E1M1', jacobiValues: E1M1_SCAN_JACOBI, segments: ['far-primary'],
    // This family reaches its far-side lunar crossing (T/2) at the first crossing of y = 0, so one crossing
    // is scanned; 80 start points find it at both C values (40 miss it at C = 3.05).
    directions: [-1], maxHalfCrossings: 1, gridPoints: 80,
  },
  // Enough members for the family to run into the Moon at both ends.
  limits: { ...LIMITS, maxMembers: 120 },
  tolerance: { rtol: 1e-12, atol: 1e-12 }, indexTolerance: 1e-6,
};

/**
 * One E1M1 job on a small discovery grid (far side of the Earth, ẏ < 0, four levels from C = 3.09 to
 * 3.152): a family that folds in C near C(L1) and changes signature at both ends, and families that end at
 * the Moon's surface and at the zero-velocity curve (fold-and-ends, signature-change-links).
 */
export const FOLD_JOB: FamilyJob = {
  key: 'test:E1M1-fold', name: 'E1M1 fold (test)', system: EARTH_MOON,
  seed: {
    // The half period of these orbits ends at the third crossing of y = 0 (beyond the Moon).
    kind: 'lap-signature', signature: 'E1M1', segments: ['far-primary'], directions: [-1], maxHalfCrossings: 3, gridPoints: 300,
    jacobiValues: [3.09, 3.12, 3.145, 3.152],
  },
  limits: { maxMembers: 2000, jacobiMin: 2.9, jacobiMax: lagrangePoints(EARTH_MOON.mu)[0]!.jacobi, maxPeriodNd: 40, unstableStop: null, initialStepNd: 1e-3, maxStepNd: 0.02 },
  tolerance: { rtol: 1e-12, atol: 1e-12 }, indexTolerance: 1e-6,
};

/**
 * An E1M2 family (72 members, C ≈ 2.874 … 3.051) that loses its lunar laps at its low-C end, where it
 * becomes E1M0: followed from one member's start state (x0, ẏ0, period; from an earlier run of this
 * project, only a start for Newton) as a hand-off, so no discovery grid is needed.
 */
export const SIGNATURE_CHANGE_JOB: FamilyJob = {
  key: 'test:E1M2-change', name: 'E1M2 signature change (test)', system: EARTH_MOON,
  seed: { kind: 'lap-signature', signature: 'E1M2', segments: ['far-primary'], directions: [1], maxHalfCrossings: 8, gridPoints: 300, jacobiValues: [3.0] },
  limits: { ...FOLD_JOB.limits, jacobiMin: 2.8 },
  tolerance: { rtol: 1e-12, atol: 1e-12 }, indexTolerance: 1e-6,
};
export const SIGNATURE_CHANGE_INPUTS: JobInputs = {
  handoffs: [{ state0: [-3.9837657157876185, 0, 0, 0, 3.661153087141796, 0], periodNd: 36.21589647976107 }],
};

const CORE_DIR = join(dirname(fileURLToPath(import.meta.url)), '../../../generator/core');
const CACHE_DIR = join(tmpdir(), 'cycler-atlas-test-orbits');
const memo = new Map<string, JobResult>();

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true })
    .flatMap((e) => (e.isDirectory() ? sourceFiles(join(dir, e.name)) : e.name.endsWith('.ts') ? [join(dir, e.name)] : []))
    .sort();
}

function cacheKey(job: FamilyJob, inputs: JobInputs): string {
  const hash = createHash('sha256').update(JSON.stringify(job)).update(JSON.stringify(inputs));
  for (const file of sourceFiles(CORE_DIR)) hash.update(relative(CORE_DIR, file)).update(readFileSync(file));
  return hash.digest('hex').slice(0, 32);
}

export function jobResult(job: FamilyJob, inputs: JobInputs = {}): JobResult {
  const key = cacheKey(job, inputs);
  let result = memo.get(key);
  if (result) return result;
  const path = join(CACHE_DIR, `${key}.json`);
  try {
    result = JSON.parse(readFileSync(path, 'utf8')) as JobResult;
  } catch {
    result = runFamilyJob(job, {}, inputs);
    // Write then rename, so that a parallel worker never reads half a file.
    mkdirSync(CACHE_DIR, { recursive: true });
    const partial = `${path}.${process.pid}.tmp`;
    writeFileSync(partial, JSON.stringify(result));
    renameSync(partial, path);
  }
  memo.set(key, result);
  return result;
}
