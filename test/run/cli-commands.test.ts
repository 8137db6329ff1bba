// The generator's commands: bad arguments give one line naming the option and what it allows, and
// exit 2 (checked in-process, plus once through bin/cycler-atlas.mjs); then, end to end through the
// bin, one family from the command line is generated, verified, exported and merged, and verify
// exits 1 once a stored state has been tampered with.
import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import Database from 'better-sqlite3';
import { beforeAll, describe, expect, it } from 'vitest';
import { createExportCommand } from '../../generator/cli/commands/export.ts';
import { createGenerateCommand } from '../../generator/cli/commands/generate.ts';
import { createMergeCommand } from '../../generator/cli/commands/merge.ts';
import { createVerifyCommand } from '../../generator/cli/commands/verify.ts';
import { useTempCatalogDir } from '../catalog-db/temp-catalog-path.ts';
import { runCommand } from './run-command.ts';

const repoRoot = fileURLToPath(new URL('../../', import.meta.url));
const tempPath = useTempCatalogDir();

function cli(...args: string[]): Promise<{ code: number | null; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, ['bin/cycler-atlas.mjs', ...args], { cwd: repoRoot });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (chunk: Buffer) => { stdout += chunk.toString(); });
    child.stderr.on('data', (chunk: Buffer) => { stderr += chunk.toString(); });
    child.on('close', (code) => resolve({ code, stdout, stderr }));
  });
}

describe('bad arguments: one line naming the option and what it allows, exit 2', () => {
  const generate = createGenerateCommand;
  it.each([
    [generate, ['--workers', 'many'], '--workers: "many" is not allowed (an integer from 1 to 256)'],
    [generate, ['--workers', '0'], '--workers: "0" is not allowed (an integer from 1 to 256)'],
    [generate, ['--shard', '4/3'], '--shard: "4/3" is not a shard (allowed: k/n with integers 1 ≤ k ≤ n ≤ 1000, e.g. 2/3)'],
    [generate, ['--progress', 'fancy'], '--progress: "fancy" is not allowed (allowed: auto, bars, lines)'],
    [generate, ['--system', 'earth-moon', '--signature', 'E2M1', '--jacobi', '3.2'],
      '--jacobi: 3.2 is outside the allowed range [1.98800, 3.18834) for earth-moon (from C(L4) − 1 up to the L1 Jacobi constant)'],
    [generate, ['--system', 'earth-moon', '--signature', 'E2M1', '--jacobi', '3.1,,3'],
      '--jacobi: "3.1,,3" is not allowed (comma-separated numbers, e.g. 3.05,3.1)'],
    [generate, ['--system', 'earth-moon', '--signature', 'X2M1'],
      '--signature: "X2M1" is not a lap signature E<n>M<m> for earth-moon (n and m integers from 1 to 20, e.g. E2M1)'],
    [generate, ['--system', 'earth-mars', '--signature', 'E2M1'],
      '--system: "earth-mars" is not allowed (allowed: earth-moon, sun-earth, jupiter-europa, saturn-titan, pluto-charon)'],
    [generate, ['--system', 'earth-moon'], '--system: needs exactly one of --signature (e.g. E2M1) or --lyapunov (L1 or L2)'],
    [generate, ['--system', 'earth-moon', '--lyapunov', 'L4'], '--lyapunov: "L4" is not allowed (allowed: L1, L2)'],
    [generate, ['--system', 'earth-moon', '--lyapunov', 'L1', '--max-members', '-3'], '--max-members: "-3" is not allowed (an integer from 1 to 100000)'],
    [generate, ['--signature', 'E2M1'], '--signature: only allowed with --system (one family without a config)'],
    [generate, ['catalogs/demo.yaml', '--system', 'earth-moon', '--lyapunov', 'L1'],
      '--system: not allowed together with a config file ("catalogs/demo.yaml"); give one or the other'],
    [generate, ['test/run/fixtures/missing.yaml'], 'config test/run/fixtures/missing.yaml: the file does not exist'],
    [generate, ['--frobnicate'], "error: unknown option '--frobnicate'"],
    [createExportCommand, ['--db', 'x.sqlite', '--format', 'xml'], '--format: "xml" is not allowed (allowed: json, csv)'],
    [createVerifyCommand, ['--db', 'test/run/fixtures/none.sqlite'],
      '--db: "test/run/fixtures/none.sqlite" does not exist (a catalog file written by generate)'],
    [createMergeCommand, ['out.sqlite', 'test/run/fixtures/none.sqlite'],
      'IN: "test/run/fixtures/none.sqlite" does not exist (a catalog file written by generate)'],
    [createMergeCommand, ['out.sqlite'], "error: missing required argument 'in'"],
  ] as const)('%#: %j', async (create, args, line) => {
    const { code, stderr } = await runCommand(create, [...args]);
    expect(stderr).toBe(`${line}\n`);
    expect(code).toBe(2);
  });

  it('prints the same line with the program prefix through the bin', async () => {
    const { code, stderr } = await cli('generate', '--workers', 'many');
    expect(stderr).toBe('cycler-atlas: --workers: "many" is not allowed (an integer from 1 to 256)\n');
    expect(code).toBe(2);
  });
});

describe('one family from the command line, then verify, export and merge (through the bin)', () => {
  const dbPath = tempPath('single.sqlite');

  beforeAll(async () => {
    const { code, stdout } = await cli('generate', '--system', 'earth-moon', '--lyapunov', 'L1', '--max-members', '12', '--db', dbPath, '--workers', '1', '--progress', 'lines');
    expect(stdout).toMatch(/done earth-moon:L1-lyapunov: 1 family, \d+ members/);
    expect(code).toBe(0);
  });

  it('verify passes on it, and fails (exit 1, orbit named) once a state is tampered with', async () => {
    const good = await cli('verify', '--db', dbPath);
    expect(good.stdout).toMatch(/^verified \d+ orbits in .* 0 over the limits$/m);
    expect(good.code).toBe(0);

    const tampered = tempPath('tampered.sqlite');
    expect((await cli('merge', tampered, dbPath)).code).toBe(0);
    const db = new Database(tampered);
    const row = db.prepare('SELECT id, state0 FROM orbits ORDER BY id LIMIT 1').get() as { id: string; state0: string };
    const state = JSON.parse(row.state0) as number[];
    state[4]! += 1e-6; // ẏ off by 1e-6: the orbit no longer closes
    db.prepare('UPDATE orbits SET state0 = ? WHERE id = ?').run(JSON.stringify(state), row.id);
    db.close();
    const bad = await cli('verify', '--db', tampered);
    expect(bad.stdout).toMatch(/; 1 over the limits$/m);
    expect(bad.stdout).toContain(`  ${row.id}: closure `);
    expect(bad.code).toBe(1);
  });

  it('exports JSON and CSV with the same orbits', async () => {
    const jsonPath = tempPath('single.json');
    expect((await cli('export', '--db', dbPath, '--format', 'json', '--out', jsonPath)).code).toBe(0);
    const exported = JSON.parse(readFileSync(jsonPath, 'utf8'));
    expect(exported.families.map((f: { id: string }) => f.id)).toEqual(['earth-moon/L1-Lyapunov/a']);
    expect(exported.scenario.team).toBe('command line');
    const csv = await cli('export', '--db', dbPath, '--format', 'csv', '--family', 'earth-moon/L1-Lyapunov/a');
    expect(csv.code).toBe(0);
    expect(csv.stdout.trimEnd().split('\n')).toHaveLength(exported.families[0].orbits.length + 1);
  });
});
