// Bad input anywhere: exactly one line naming the field or option, the value and what is allowed; exit
// code 2; nothing already in a catalog lost or changed (checksum of every row before and after).
// One small catalog is generated once and reused; each case runs its command in this process.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Command } from 'commander';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createGenerateCommand } from '../../generator/cli/commands/generate.ts';
import { createMergeCommand } from '../../generator/cli/commands/merge.ts';
import { catalogChecksum } from './catalog-checksum.ts';
import { copyCatalog, generateTiny, tinyConfigWith, writeText } from './hostile-inputs.fixture.ts';
import { runCommand } from './run-command.ts';

const dir = mkdtempSync(join(tmpdir(), 'cycler-atlas-hostile-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const base = join(dir, 'base.sqlite');
const other = join(dir, 'other-settings.sqlite');
const config = (name: string, text: string) => writeText(dir, name, text);

interface HostileCase {
  item: number;
  what: string;
  create: () => Command;
  /** Built when the case runs (after the fixtures exist). */
  args: () => string[];
  firstLine: RegExp;
  /** Catalogs that must be unchanged (default: the base catalog). */
  catalogs?: () => string[];
}

const generate = createGenerateCommand;
const merge = createMergeCommand;

const cases: HostileCase[] = [
  {
    item: 2, what: 'generate with a config that overrides a GM (μ changes)', create: generate,
    args: () => [config('mu.yaml', tinyConfigWith('preset: earth-moon', '{ preset: earth-moon, secondaryGmKm3S2: 4900 }')), '--db', base],
    firstLine: /^config \S*mu\.yaml: earth-moon system constant mu differs from the catalog's \(0\.01215058\d+ → 0\.01214372\d+\); --recompute-changed deletes and recomputes the affected families$/,
  },
  {
    item: 2, what: 'generate with a config that drops the synodic month', create: generate,
    args: () => [config('synodic.yaml', tinyConfigWith('preset: earth-moon', '{ preset: earth-moon, synodicPeriodDays: null }')), '--db', base],
    firstLine: /^config \S*synodic\.yaml: earth-moon system constant synodicPeriodDays differs from the catalog's \(29\.53\d* → null\); --recompute-changed/,
  },
  {
    item: 2, what: 'generate with another integration tolerance', create: generate,
    args: () => [config('rtol.yaml', tinyConfigWith('rtol: 1.0e-12', 'rtol: 1.0e-11')), '--db', base],
    firstLine: /^config \S*rtol\.yaml: job earth-moon:L1-lyapunov setting tolerance\.rtol \(1e-12 → 1e-11\) differs from the catalog's; --recompute-changed/,
  },
  {
    item: 2, what: 'generate with another member limit for a done job', create: generate,
    args: () => [config('members.yaml', tinyConfigWith('maxMembers: 6', 'maxMembers: 7')), '--db', base],
    firstLine: /^config \S*members\.yaml: job earth-moon:L1-lyapunov setting limits\.maxMembers \(6 → 7\) differs from the catalog's; --recompute-changed/,
  },
  {
    item: 4, what: 'merge an input whose done job used other limits', create: merge,
    args: () => [join(dir, 'merge-out.sqlite'), other],
    firstLine: /^mergeCatalogs: job earth-moon:L1-lyapunov differs between \S*merge-out\.sqlite and \S*other-settings\.sqlite: limits\.maxMembers \(6 → 7\) \(computed with other settings; merge only catalogs of the same config\)$/,
    catalogs: () => [join(dir, 'merge-out.sqlite'), other],
  },
];

describe('hostile inputs: one line, exit 2, catalogs unchanged', () => {
  beforeAll(async () => {
    await generateTiny(base);
    await generateTiny(other, tinyConfigWith('maxMembers: 6', 'maxMembers: 7'));
    copyCatalog(base, join(dir, 'merge-out.sqlite'));
  });

  it.each(cases.map((c) => [`item ${c.item}: ${c.what}`, c] as const))('%s', async (_name, c) => {
    const catalogs = c.catalogs?.() ?? [base];
    const before = catalogs.map(catalogChecksum);
    const { code, stderr } = await runCommand(c.create, c.args());
    const lines = stderr.trimEnd().split('\n');
    expect(lines[0]).toMatch(c.firstLine);
    expect(lines).toHaveLength(1);
    expect(code).toBe(2);
    expect(catalogs.map(catalogChecksum)).toEqual(before);
  });
});
