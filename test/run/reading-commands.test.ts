// Reading commands: verify on a catalog with no families reports 0 orbits (exit 0); export and verify
// read a finished catalog from a read-only directory without creating any file beside it.
import { chmodSync, mkdirSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import { openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import { createExportCommand } from '../../generator/cli/commands/export.ts';
import { createVerifyCommand } from '../../generator/cli/commands/verify.ts';
import { generateTiny } from './hostile-inputs.fixture.ts';
import { runCommandQuietly } from './run-command-quietly.ts';

const dir = mkdtempSync(join(tmpdir(), 'cycler-atlas-reading-'));
afterAll(() => {
  chmodSync(join(dir, 'read-only'), 0o755);
  rmSync(dir, { recursive: true, force: true });
});

describe('reading commands', () => {
  it('verify on a catalog without families reports 0 orbits and exits 0', async () => {
    const empty = join(dir, 'empty.sqlite');
    openCatalogForWrite(empty).close();
    const { code, stderr, printed } = await runCommandQuietly(createVerifyCommand, ['--db', empty]);
    expect(stderr).toBe('');
    expect(printed[0]).toMatch(/^verified 0 orbits in /);
    expect(code).toBe(0);
  });

  it('a finished catalog is one self-contained file that export and verify read from a read-only directory', async () => {
    const readOnly = join(dir, 'read-only');
    mkdirSync(readOnly);
    const path = join(readOnly, 'finished.sqlite');
    await generateTiny(path);
    const db = new Database(path, { readonly: true });
    expect(db.pragma('journal_mode', { simple: true })).toBe('delete'); // no -wal/-shm needed to read it
    db.close();
    chmodSync(path, 0o444);
    chmodSync(readOnly, 0o555); // enforced for non-root users; for root the file listing below still checks
    const exported = await runCommandQuietly(createExportCommand, ['--db', path, '--format', 'csv']);
    const verified = await runCommandQuietly(createVerifyCommand, ['--db', path]);
    expect([exported.code, exported.stderr, verified.code, verified.stderr]).toEqual([0, '', 0, '']);
    expect(verified.printed[0]).toMatch(/^verified 6 orbits in .*; 0 over the limits$/);
    expect(readdirSync(readOnly)).toEqual(['finished.sqlite']);
  });
});
