// generate --recompute-changed: a config that changes a system constant or a done job's settings
// deletes the affected families and computes them again with the new settings.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { openCatalogForRead } from '../../catalog-db/open-catalog.ts';
import { createGenerateCommand } from '../../generator/cli/commands/generate.ts';
import { verifyCatalog } from '../../generator/run/verify-catalog.ts';
import { generateTiny, tinyConfigWith, writeText } from './hostile-inputs.fixture.ts';
import { runCommandQuietly } from './run-command-quietly.ts';

const dir = mkdtempSync(join(tmpdir(), 'cycler-atlas-recompute-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function read(path: string) {
  const reader = openCatalogForRead(path);
  try {
    return { mu: reader.systems()[0]!.mu, families: reader.families(), jobs: reader.jobSettings(), firstState: reader.orbits()[0]!.state0 };
  } finally {
    reader.close();
  }
}

describe('generate --recompute-changed', () => {
  it('recomputes the families of a system whose μ changed, and they verify under the new μ', async () => {
    const db = join(dir, 'mu.sqlite');
    await generateTiny(db);
    const before = read(db);
    const configPath = writeText(dir, 'mu.yaml', tinyConfigWith('preset: earth-moon', '{ preset: earth-moon, secondaryGmKm3S2: 4900 }'));
    const { code } = await runCommandQuietly(createGenerateCommand, [configPath, '--db', db, '--workers', '1', '--progress', 'lines', '--recompute-changed']);
    expect(code).toBe(0);
    const after = read(db);
    // μ = GM₂ / (GM₁ + GM₂) with the preset's GM Earth 398600.435436 km³/s² (DESIGN.md, from memory).
    expect(after.mu).toBeCloseTo(4900 / (398600.435436 + 4900), 15);
    expect(after.families.map((f) => [f.id, f.memberCount])).toEqual(before.families.map((f) => [f.id, f.memberCount]));
    expect(after.firstState).not.toEqual(before.firstState); // recomputed, not kept
    expect((after.jobs[0]!.settings.system as { mu: number }).mu).toBe(after.mu);
    expect(verifyCatalog(db).failures).toEqual([]);
  });

  it('recomputes a done job whose member limit changed', async () => {
    const db = join(dir, 'members.sqlite');
    await generateTiny(db);
    const configPath = writeText(dir, 'members.yaml', tinyConfigWith('maxMembers: 6', 'maxMembers: 8'));
    const { code } = await runCommandQuietly(createGenerateCommand, [configPath, '--db', db, '--workers', '1', '--progress', 'lines', '--recompute-changed']);
    expect(code).toBe(0);
    const after = read(db);
    expect(after.families.map((f) => f.memberCount)).toEqual([8]);
    expect((after.jobs[0]!.settings.limits as { maxMembers: number }).maxMembers).toBe(8);
  });
});
