// Bad input anywhere: exactly one line naming the field or option, the value and what is allowed; exit
// code 2; nothing already in a catalog lost or changed (checksum of every row before and after).
// One small catalog is generated once and reused; each case runs its command in this process.
import { chmodSync, mkdirSync, mkdtempSync, rmSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import type { Command } from 'commander';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createExportStateCommand } from '../../generator/cli/commands/export-state.ts';
import { createExportCommand } from '../../generator/cli/commands/export.ts';
import { createGenerateCommand } from '../../generator/cli/commands/generate.ts';
import { createMergeCommand } from '../../generator/cli/commands/merge.ts';
import { createVerifyCommand } from '../../generator/cli/commands/verify.ts';
import { catalogChecksum } from './catalog-checksum.ts';
import { copyCatalog, generateTiny, TINY_CONFIG, tinyConfigWith, writeText } from './hostile-inputs.fixture.ts';
import { runCommand } from './run-command.ts';

const dir = mkdtempSync(join(tmpdir(), 'cycler-atlas-hostile-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const base = join(dir, 'base.sqlite');
const other = join(dir, 'other-settings.sqlite');
const config = (name: string, text: string) => writeText(dir, name, text);
const link = join(dir, 'link-to-base.sqlite');
const stopped = join(dir, 'stopped.sqlite');
const folder = join(dir, 'a-folder');
const longName = join(dir, `${'n'.repeat(300)}.sqlite`);
const quoted = (path: string) => path.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

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
const exportCatalog = createExportCommand;
const exportState = createExportStateCommand;
const verify = createVerifyCommand;
const stateArgs = ['--orbit', 'earth-moon/L1-Lyapunov/a/0000', '--epoch', '2030-01-01T00:00:00Z'];

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
    item: 2, what: 'generate with other limits on a job that a run with another config stopped part-way', create: generate,
    args: () => [config('members-stopped.yaml', tinyConfigWith('maxMembers: 6', 'maxMembers: 7')), '--db', stopped],
    firstLine: /^config \S*members-stopped\.yaml: job earth-moon:L1-lyapunov was stopped part-way by run 1 with another config \(its written families may follow other settings\); --recompute-changed/,
    catalogs: () => [stopped],
  },
  {
    item: 4, what: 'merge an input whose done job used other limits', create: merge,
    args: () => [join(dir, 'merge-out.sqlite'), other],
    firstLine: /^mergeCatalogs: job earth-moon:L1-lyapunov differs between \S*merge-out\.sqlite and \S*other-settings\.sqlite: limits\.maxMembers \(6 → 7\) \(computed with other settings; merge only catalogs of the same config\)$/,
    catalogs: () => [join(dir, 'merge-out.sqlite'), other],
  },
  {
    item: 3, what: 'export --out the catalog itself', create: exportCatalog,
    args: () => ['--db', base, '--out', base],
    firstLine: new RegExp(`^--out: "${quoted(base)}" is the file given as --db \\("${quoted(base)}"\\); writing it would destroy it \\(give another file\\)$`),
  },
  {
    item: 3, what: 'export --out a symlink to the catalog', create: exportCatalog,
    args: () => ['--db', base, '--format', 'csv', '--out', link],
    firstLine: /^--out: "\S*link-to-base\.sqlite" is the file given as --db /,
  },
  {
    item: 3, what: "export --out the catalog's WAL file", create: exportCatalog,
    args: () => ['--db', base, '--out', `${base}-wal`],
    firstLine: /^--out: "\S*base\.sqlite-wal" is the file given as --db /,
  },
  {
    item: 3, what: 'export-state --out the catalog itself', create: exportState,
    args: () => ['--db', base, ...stateArgs, '--out', base],
    firstLine: /^--out: "\S*base\.sqlite" is the file given as --db /,
  },
  {
    item: 3, what: 'merge into a symlink to one of its inputs', create: merge,
    args: () => [link, base],
    firstLine: /^OUT: "\S*link-to-base\.sqlite" is the file given as IN \("\S*base\.sqlite"\); writing it would destroy it/,
  },
  { item: 11, what: 'verify --db a directory', create: verify, args: () => ['--db', folder],
    firstLine: /^--db: "\S*a-folder" is a directory \(a catalog file written by generate\)$/ },
  { item: 11, what: 'verify --db an empty path', create: verify, args: () => ['--db', ''],
    firstLine: /^--db: "" is not allowed \(a catalog file written by generate; an empty path names no file\)$/ },
  { item: 11, what: 'export --db a 300-character name', create: exportCatalog, args: () => ['--db', longName],
    firstLine: /^--db: "\S+" is not allowed \(a catalog file written by generate; a file or directory name of at most 255 bytes, "\S+" has 307\)$/ },
  { item: 11, what: 'generate --db a directory', create: generate, args: () => ['--db', folder],
    firstLine: /^--db: "\S*a-folder" is a directory \(a catalog file to write, created if missing\)$/ },
  { item: 11, what: 'generate --db an empty path', create: generate, args: () => ['--db', ''],
    firstLine: /^--db: "" is not allowed \(a catalog file to write, created if missing; an empty path names no file\)$/ },
  { item: 11, what: 'generate --db a 300-character name', create: generate, args: () => ['--db', longName],
    firstLine: /^--db: "\S+" is not allowed \(a catalog file to write, created if missing; a file or directory name of at most 255 bytes/ },
  { item: 11, what: 'generate --db in a missing directory', create: generate, args: () => ['--db', join(dir, 'nowhere', 'x.sqlite')],
    firstLine: /^--db: "\S*nowhere\/x\.sqlite" cannot be created: directory \S*nowhere does not exist \(a catalog file to write, created if missing\)$/ },
  { item: 11, what: 'export --out a directory', create: exportCatalog, args: () => ['--db', base, '--out', folder],
    firstLine: /^--out: "\S*a-folder" is a directory \(a file to write\)$/ },
  { item: 11, what: "merge's output a directory", create: merge, args: () => [folder, base],
    firstLine: /^OUT: "\S*a-folder" is a directory \(a catalog file to write, created if missing\)$/ },
  { item: 11, what: "merge's input a directory", create: merge, args: () => [join(dir, 'merge-out.sqlite'), folder],
    firstLine: /^IN: "\S*a-folder" is a directory \(a catalog file written by generate\)$/,
    catalogs: () => [join(dir, 'merge-out.sqlite')] },
  {
    item: 12, what: 'a YAML alias bomb', create: generate, args: () => [config('bomb.yaml', aliasBomb()), '--db', base],
    firstLine: /^config bomb\.yaml: YAML aliases expand too far \(at most 1000 alias uses; /,
  },
  {
    item: 12, what: 'a UTF-16 config', create: generate, args: () => [writeText(dir, 'utf16.yaml', utf16(TINY_CONFIG)), '--db', base],
    firstLine: /^config utf16\.yaml: is UTF-16 text \(save it as UTF-8\) \(a catalog config is YAML text in UTF-8\)$/,
  },
  {
    item: 12, what: 'a binary file as config', create: generate,
    args: () => [writeText(dir, 'binary.yaml', Buffer.from([0x53, 0x51, 0x4c, 0x69, 0x74, 0x65, 0x00, 0x03, 0xff, 0x10])), '--db', base],
    firstLine: /^config binary\.yaml: holds a NUL byte at offset 6, so it is not text \(UTF-16 or a binary file\?\) \(a catalog config is YAML text in UTF-8\)$/,
  },
  {
    item: 12, what: 'a near-zero GM (μ ≈ 1e-306)', create: generate,
    args: () => [config('gm.yaml', tinyConfigWith('preset: earth-moon', '{ preset: earth-moon, secondaryGmKm3S2: 1.0e-300 }')), '--db', base],
    firstLine: /^config gm\.yaml: systems\[0\]\.secondaryGmKm3S2: 1e-300 gives mass ratio 2\.50878e-306 for earth-moon, outside the allowed range \[1e-10, 0\.5\]/,
  },
  {
    item: 13, what: 'a Moon radius larger than its distance to L1', create: generate,
    args: () => [config('radius.yaml', tinyConfigWith('preset: earth-moon', '{ preset: earth-moon, secondaryRadiusKm: 400000 }')), '--db', base],
    // x(L1) = 0.836915 for Earth–Moon (DESIGN.md, Szebehely 1967): the Moon's centre is (1 − μ − x(L1)) · 384400 km ≈ 58019 km from L1.
    firstLine: /^config radius\.yaml: systems\[0\]\.secondaryRadiusKm: 400000 is outside the allowed range \(0\.0, 5801[89]\.\d\) for earth-moon \(km; the Moon must end before L1/,
  },
  {
    item: 13, what: 'a length unit of 1e-9 km', create: generate,
    args: () => [config('length.yaml', tinyConfigWith('preset: earth-moon', '{ preset: earth-moon, lengthUnitKm: 1.0e-9 }')), '--db', base],
    firstLine: /^config length\.yaml: systems\[0\]\.lengthUnitKm: 1e-9 is too small for earth-moon: the Earth \(radius 6378\.137 km\) must end before L1/,
  },
  {
    item: 13, what: 'μ ≈ 1e-24', create: generate,
    args: () => [config('tiny-mu.yaml', tinyConfigWith('preset: earth-moon', '{ preset: earth-moon, secondaryGmKm3S2: 4.0e-19 }')), '--db', base],
    firstLine: /^config tiny-mu\.yaml: systems\[0\]\.secondaryGmKm3S2: 4e-19 gives mass ratio 1\.00\d*e-24 for earth-moon, outside the allowed range \[1e-10, 0\.5\]/,
  },
  { item: 11, what: 'verify --db a text file', create: verify, args: () => ['--db', writeText(dir, 'notes.txt', 'not a catalog\n')],
    firstLine: /^--db: "\S*notes\.txt" is not a catalog: not an SQLite file \(a catalog file written by generate\)$/ },
  { item: 11, what: 'generate --db a text file', create: generate, args: () => ['--db', writeText(dir, 'notes.txt', 'not a catalog\n')],
    firstLine: /^--db: "\S*notes\.txt" is not a catalog: not an SQLite file \(a catalog file to write, created if missing\)$/ },
];

/** Each level repeats the one before nine times: 12 lines that expand to 9^12 nodes ("billion laughs"). */
function aliasBomb(): string {
  const lines = ['l0: &l0 [x, x, x, x, x, x, x, x, x]'];
  for (let level = 1; level < 12; level++) lines.push(`l${level}: &l${level} [${Array(9).fill(`*l${level - 1}`).join(', ')}]`);
  return `${lines.join('\n')}\n`;
}

/** UTF-16 little-endian with its byte-order mark, as some editors save by default. */
function utf16(text: string): Buffer {
  return Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(text, 'utf16le')]);
}

describe('hostile inputs: one line, exit 2, catalogs unchanged', () => {
  beforeAll(async () => {
    await generateTiny(base);
    await generateTiny(other, tinyConfigWith('maxMembers: 6', 'maxMembers: 7'));
    copyCatalog(base, join(dir, 'merge-out.sqlite'));
    symlinkSync(base, link);
    // A job stopped part-way: its family is written, its done mark (and so its stored settings) is not.
    const db = new Database(copyCatalog(base, stopped));
    db.exec('DELETE FROM jobs');
    db.close();
    mkdirSync(folder);
  });

  // Root may write any file, so this case can only be seen by another user.
  it.skipIf(process.getuid?.() === 0)('item 11: generate --db a read-only catalog', async () => {
    const readOnly = copyCatalog(base, join(dir, 'read-only.sqlite'));
    chmodSync(readOnly, 0o444);
    const before = catalogChecksum(readOnly);
    const { code, stderr } = await runCommand(generate, ['--db', readOnly]);
    expect(stderr).toBe(`--db: "${readOnly}" is read-only (a catalog file to write, created if missing)\n`);
    expect(code).toBe(2);
    expect(catalogChecksum(readOnly)).toBe(before);
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
