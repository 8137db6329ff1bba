// One generate per catalog at a time: a second one is refused (exit 2) or waits with --wait; a run
// killed with SIGKILL leaves no stale lock. The summary line states what the file holds.
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openCatalogForRead, openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import { createGenerateCommand } from '../../generator/cli/commands/generate.ts';
import { lockPathOf, tryLockCatalog } from '../../generator/run/catalog-lock.ts';
import { catalogChecksum } from './catalog-checksum.ts';
import { generateTiny, TINY_CONFIG, writeText } from './hostile-inputs.fixture.ts';
import { runCommandQuietly } from './run-command-quietly.ts';

const dir = mkdtempSync(join(tmpdir(), 'cycler-atlas-lock-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const base = join(dir, 'base.sqlite');
const repoRoot = fileURLToPath(new URL('../../', import.meta.url));
const quiet = ['--workers', '1', '--progress', 'lines'];

const generateQuietly = (args: string[]) => runCommandQuietly(createGenerateCommand, args);

describe('catalog lock', () => {
  let configPath: string;
  beforeAll(async () => {
    await generateTiny(base);
    configPath = writeText(dir, 'tiny.yaml', TINY_CONFIG);
  });

  it('refuses a second run while another holds the catalog, and leaves the catalog as it was', async () => {
    const release = tryLockCatalog(base)!;
    const before = catalogChecksum(base);
    try {
      const { code, stderr } = await generateQuietly([configPath, '--db', base, ...quiet]);
      expect(stderr).toBe(`--db: "${base}" is held by another run (lock ${lockPathOf(base)}); let it finish, or add --wait to wait for it\n`);
      expect(code).toBe(2);
    } finally {
      release();
    }
    expect(catalogChecksum(base)).toBe(before);
  });

  it('is shared by every spelling of one catalog: a symlink to it is held too', () => {
    const link = join(dir, 'link.sqlite');
    symlinkSync(base, link);
    const release = tryLockCatalog(base)!;
    try {
      expect(tryLockCatalog(link)).toBeNull();
    } finally {
      release();
    }
  });

  it('with --wait, starts once the other run lets go', async () => {
    const release = tryLockCatalog(base)!;
    let released = false;
    const run = generateQuietly([configPath, '--db', base, ...quiet, '--wait']).then((result) => ({ ...result, released }));
    await new Promise((resolve) => setTimeout(resolve, 1500));
    released = true;
    release();
    const result = await run;
    expect(result.released).toBe(true); // it did not finish while the lock was held
    expect(result.code).toBe(0);
    expect(result.printed.at(-1)).toMatch(/0 job\(s\) done, 1 skipped/);
  });

  it('is free again once a process holding it is killed with SIGKILL', async () => {
    const holder = spawn(process.execPath, ['-e', `
      const Database = require('better-sqlite3');
      const db = new Database(${JSON.stringify(lockPathOf(base))}, { timeout: 0 });
      db.exec('BEGIN EXCLUSIVE');
      console.log('locked');
      setInterval(() => {}, 1000);`], { cwd: repoRoot });
    await new Promise<void>((resolve) => holder.stdout.once('data', () => resolve()));
    expect(tryLockCatalog(base)).toBeNull();
    const exited = new Promise((resolve) => holder.once('exit', resolve));
    holder.kill('SIGKILL');
    await exited;
    const release = tryLockCatalog(base);
    expect(release).not.toBeNull();
    release!();
  });

  it('the summary line states the families and members the catalog holds, also after a failed write', async () => {
    const path = join(dir, 'failing.sqlite');
    openCatalogForWrite(path).close();
    const raw = new Database(path);
    // Stands in for a full disk: the second job's family cannot be written.
    raw.exec(`CREATE TRIGGER no_room BEFORE INSERT ON families WHEN NEW.id LIKE '%L2%' BEGIN SELECT RAISE(ABORT, 'database or disk is full'); END`);
    raw.close();
    const twoJobs = writeText(dir, 'two.yaml', `${TINY_CONFIG}  - { system: earth-moon, lyapunov: L2, amplitudeNd: 1.0e-3 }\n`);
    const { code, printed } = await generateQuietly([twoJobs, '--db', path, ...quiet]);
    expect(code).toBe(1);
    const reader = openCatalogForRead(path);
    const families = reader.families();
    const members = reader.orbits().length;
    reader.close();
    expect(families).toHaveLength(1);
    expect(printed.at(-1)).toContain(`1 job(s) done, 0 skipped (done before), 1 failed; 1 families, ${members} members written to ${path} (now 1 families, ${members} members)`);
  });
});
