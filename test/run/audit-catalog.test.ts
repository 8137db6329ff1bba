// The completeness audit on a small catalog (test/run/fixtures/audit-catalog.yaml: one E1M1 family over
// a narrowed C range and the L1 Lyapunov family):
// - it passes on the complete catalog (exit 0, scans on 2 worker threads) and stores its row, read back
//   with the seed and levels;
// - on a copy with the E1M1 family deleted it exits 1 and prints the orbits it found, which lie on the
//   deleted family (mirror theorem, Roy & Ovenden 1955: each is a symmetric periodic orbit of that family),
//   the same levels with one thread as with two;
// - membership holds at either perpendicular crossing: an orbit re-corrected from its other crossing
//   (mirror theorem) is on the family, and so is one between members of a thinned family (refinement);
// - stopped after its first scan (shouldStop), or by Ctrl-C through the bin (exit 130), it says so and
//   stores nothing (common practice);
// - bad arguments of audit and of generate --shard auto give one line and exit 2.
import { spawn } from 'node:child_process';
import { copyFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import Database from 'better-sqlite3';
import { beforeAll, describe, expect, it } from 'vitest';
import { prepareAuditStore } from '../../catalog-db/audit-store.ts';
import type { AuditRow } from '../../catalog-db/audit-types.ts';
import { openCatalogForRead } from '../../catalog-db/open-catalog.ts';
import { openSqliteForRead } from '../../catalog-db/open-sqlite.ts';
import { createAuditCommand, formatMiss } from '../../generator/cli/commands/audit.ts';
import { createGenerateCommand } from '../../generator/cli/commands/generate.ts';
import { storedOrbitFootprint, type StoredFootprint } from '../../generator/core/orbits/audit-footprint.ts';
import { liesOnCatalogFamily } from '../../generator/core/orbits/audit-membership.ts';
import { auditContext, type AuditOrbit } from '../../generator/core/orbits/audit-scan.ts';
import { correctAtFixedX0 } from '../../generator/core/orbits/correct-on-arc.ts';
import { propagate } from '../../generator/core/propagation/propagate.ts';
import { auditCatalog } from '../../generator/run/audit-catalog.ts';
import { lapSignatureJobsOf } from '../../generator/run/audit-jobs-of-catalog.ts';
import { generateCatalog } from '../../generator/run/generate-catalog.ts';
import { useTempCatalogDir } from '../catalog-db/temp-catalog-path.ts';
import { runCli } from '../cli/run-cli.ts';
import { runCommand } from './run-command.ts';

const configPath = fileURLToPath(new URL('./fixtures/audit-catalog.yaml', import.meta.url));
const tempPath = useTempCatalogDir();
const REPO_ROOT = fileURLToPath(new URL('../../', import.meta.url));
const BIN = fileURLToPath(new URL('../../bin/cycler-atlas.mjs', import.meta.url));
const completePath = tempPath('complete.sqlite');
const E1M1_FAMILY = 'earth-moon/E1M1/a';
const LEVELS = '3';

function storedAudits(path: string): AuditRow[] {
  const db = openSqliteForRead(path);
  try {
    return prepareAuditStore(db).audits();
  } finally {
    db.close();
  }
}

/** The E1M1 job as stored and its family's member footprints, read from the complete catalog. */
function storedJobAndFamily() {
  const reader = openCatalogForRead(completePath);
  try {
    const [job] = lapSignatureJobsOf(reader.jobSettings());
    const members = reader.orbits(E1M1_FAMILY).map((o) => storedOrbitFootprint(job.system.mu, o.state0, o.period, job.tolerance));
    return { job, members };
  } finally {
    reader.close();
  }
}

describe('cycler-atlas audit', () => {
  beforeAll(async () => {
    const summary = await generateCatalog({ configPath, dbPath: completePath, workers: 2, progress: 'lines', handleSigint: false, log: () => {} });
    expect(summary).toMatchObject({ jobsDone: 2, jobsFailed: [], interrupted: false });
  });

  it('passes on the complete catalog (exit 0) and stores the audit with its seed and levels', async () => {
    const run = await runCli(['audit', '--db', completePath, '--levels', LEVELS, '--seed', '11', '--workers', '2']);
    expect(run.stdout).toContain('seed 11 (repeat with --seed 11)');
    expect(run.code, run.stdout + run.stderr).toBe(0);
    // Progress on stderr says what, how far and the rate (common practice).
    expect(run.stderr).toMatch(/audit: scans \(level × segment × direction\): 3\/3 \(100%\), [\d.]+\/s/);
    const [audit] = storedAudits(completePath);
    expect(audit).toMatchObject({ seed: 11, levelsPerSystem: 3, jobsAudited: 1, misses: [] });
    expect(audit.levels['earth-moon']).toHaveLength(3);
    // Every level meets the family (the job's C range is a stretch of it), found once per level.
    expect(audit.orbitsChecked).toBeGreaterThanOrEqual(3);
  });

  it('finds the family deleted from a copy (exit 1), printing orbits of that family with their states', async () => {
    const copyPath = tempPath('without-e1m1.sqlite');
    copyFileSync(completePath, copyPath);
    const db = new Database(copyPath);
    db.pragma('foreign_keys = ON');
    db.prepare('DELETE FROM families WHERE id = ?').run(E1M1_FAMILY);
    db.close();
    const run = await runCli(['audit', '--db', copyPath, '--levels', LEVELS, '--seed', '11', '--workers', '1']);
    expect(run.code, run.stdout + run.stderr).toBe(1);
    const [audit] = storedAudits(copyPath);
    // Same seed, same levels as on the complete catalog (the draw is seeded).
    expect(audit.levels).toEqual(storedAudits(completePath)[0].levels);
    expect(audit.misses).toHaveLength(3);
    for (const miss of audit.misses) expect(run.stdout).toContain(formatMiss(miss));
    const { job, members } = storedJobAndFamily();
    const context = auditContext(job, 4);
    for (const miss of audit.misses) {
      const orbit: AuditOrbit = { x0: miss.state0[0], vy0: miss.state0[4], xHalf: miss.xHalf, periodNd: miss.periodNd, jacobi: miss.jacobi, halfCrossings: miss.halfCrossings, segment: 'far-primary', direction: -1 };
      expect(liesOnCatalogFamily(context, orbit, [members])).toBe(true);
      expect(liesOnCatalogFamily(context, orbit, [])).toBe(false);
    }
  });

  it('stops when asked between scans and leaves the catalog as it was', async () => {
    const before = storedAudits(completePath).length;
    let polls = 0;
    const report = await auditCatalog({ dbPath: completePath, levelsPerSystem: 3, seed: 5, log: () => {}, shouldStop: () => polls++ > 0 });
    expect(report.interrupted).toBe(true);
    expect(report.auditId).toBeUndefined();
    expect(storedAudits(completePath)).toHaveLength(before);
  });

  it.each(['1', '2'])('exits 130 on Ctrl-C (SIGINT) with %s worker(s), storing nothing', async (workers) => {
    const before = storedAudits(completePath).length;
    const child = spawn(process.execPath, [BIN, 'audit', '--db', completePath, '--levels', '200', '--seed', '3', '--workers', workers], { cwd: REPO_ROOT });
    let stderr = '';
    let stdout = '';
    let interrupted = false;
    child.stdout.on('data', (chunk: Buffer) => { stdout += chunk.toString(); });
    child.stderr.on('data', (chunk: Buffer) => {
      stderr += chunk.toString();
      // Once the stored members are measured the scans are under way: interrupt them (once: a second
      // Ctrl-C quits at once).
      if (!interrupted && stderr.includes('stored members measured')) interrupted = child.kill('SIGINT');
    });
    const code = await new Promise<number | null>((resolve) => child.on('close', resolve));
    expect(code, stdout + stderr).toBe(130);
    expect(stderr).toContain('interrupt: stopping');
    expect(stdout).toContain('nothing stored');
    expect(storedAudits(completePath)).toHaveLength(before);
  });

  it('counts an orbit corrected from its other perpendicular crossing, and one between thinned members, as on the family', () => {
    const { job, members } = storedJobAndFamily();
    const context = auditContext(job, 4);
    const mu = job.system.mu;
    const middle = members[Math.floor(members.length / 2)];
    // The state at T/2 is perpendicular (mirror theorem); correct from there, x fixed.
    const half = propagate(mu, [middle.x0, 0, 0, middle.vy0], middle.periodNd / 2, job.tolerance);
    expect(Math.abs(half.state[2])).toBeLessThan(1e-8);
    const other = correctAtFixedX0(mu, 1, half.state[0], half.state[3], context.corrector)!;
    expect(other).not.toBeNull();
    const fromOther: AuditOrbit = {
      x0: other.x0, vy0: other.vy0, xHalf: other.shot.state[0], periodNd: 2 * other.shot.tHalfNd,
      jacobi: storedOrbitFootprint(mu, [other.x0, 0, 0, 0, other.vy0, 0], 2 * other.shot.tHalfNd, job.tolerance).jacobi,
      halfCrossings: 1, segment: 'far-secondary', direction: 1,
    };
    expect(Math.abs(fromOther.xHalf - middle.x0)).toBeLessThan(1e-6);
    expect(liesOnCatalogFamily(context, fromOther, [members])).toBe(true);
    // Every 12th member only (plus the last): the orbit between two kept members is still found on it.
    const thinned: StoredFootprint[] = members.filter((_, i) => i % 12 === 0 || i === members.length - 1);
    const between = members[Math.floor(members.length / 2) + 6];
    const orbit: AuditOrbit = { ...between, halfCrossings: 1, segment: 'far-primary', direction: -1 };
    expect(liesOnCatalogFamily(context, orbit, [thinned])).toBe(true);
  });
});

describe('audit and generate --shard auto: bad arguments in one line naming the option or variable, exit 2 (common practice)', () => {
  const cleanEnv = () => {
    const saved = { ...process.env };
    for (const name of ['SLURM_ARRAY_TASK_ID', 'SLURM_ARRAY_TASK_MIN', 'SLURM_ARRAY_TASK_COUNT', 'SLURM_ARRAY_TASK_STEP', 'JOB_COMPLETION_INDEX']) delete process.env[name];
    return () => { process.env = saved; };
  };

  it.each([
    [createAuditCommand, ['--levels', '0'], '--levels: "0" is not allowed (an integer from 1 to 1000)'],
    [createAuditCommand, ['--seed', '-4'], '--seed: "-4" is not allowed (an integer from 0 to 4294967295)'],
    [createAuditCommand, ['--grid-factor', '0.5'], '--grid-factor: "0.5" is not allowed (an integer from 1 to 64)'],
    [createAuditCommand, ['--db', 'test/run/fixtures/none.sqlite'], '--db: "test/run/fixtures/none.sqlite" does not exist (a catalog file written by generate)'],
    [createAuditCommand, ['--db', 'test/run/fixtures/audit-catalog.yaml'], '--db: "test/run/fixtures/audit-catalog.yaml" is not a catalog: not an SQLite file (a catalog file written by generate)'],
    [createGenerateCommand, ['--shard', 'auto', '--db', 'test/run/fixtures/none.sqlite'],
      '--shard auto: neither SLURM_ARRAY_TASK_ID (SLURM job array) nor JOB_COMPLETION_INDEX (Kubernetes Indexed Job) is set; give --shard k/n instead'],
    [createGenerateCommand, ['--shard', '1/2', '--shard-count', '2'], '--shard-count: only allowed with --shard auto (got --shard 1/2)'],
  ] as const)('%#: %j', async (create, args, line) => {
    const restore = cleanEnv();
    try {
      const { code, stderr } = await runCommand(create, [...args]);
      expect(stderr).toBe(`${line}\n`);
      expect(code).toBe(2);
    } finally {
      restore();
    }
  });

  it('names a SLURM variable out of range with its value and the allowed ids', async () => {
    const restore = cleanEnv();
    Object.assign(process.env, { SLURM_ARRAY_TASK_ID: '9', SLURM_ARRAY_TASK_MIN: '5', SLURM_ARRAY_TASK_COUNT: '4' });
    try {
      const { code, stderr } = await runCommand(createGenerateCommand, ['--shard', 'auto', '--db', 'test/run/fixtures/none.sqlite']);
      expect(stderr).toBe('SLURM_ARRAY_TASK_ID: "9" is not allowed (an integer from 5 to 8: SLURM_ARRAY_TASK_MIN to MIN + 3)\n');
      expect(code).toBe(2);
    } finally {
      restore();
    }
  });
});
