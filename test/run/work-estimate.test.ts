// Absurd work is refused before it starts (issue: a 100-level × 100,000-point × 64-crossing grid started
// silently): one line with the estimate, exit 2, the catalog untouched; --force lets it through the check.
// The bound and the estimate are our own (work-estimate.ts); grid points × crossings is simple counting.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { buildJobs } from '../../generator/config/build-jobs.ts';
import { loadConfig } from '../../generator/config/load-config.ts';
import { createGenerateCommand } from '../../generator/cli/commands/generate.ts';
import { estimateDiscoveryWork, MAX_GRID_WORK } from '../../generator/run/work-estimate.ts';
import { catalogChecksum } from './catalog-checksum.ts';
import { runCommand } from './run-command.ts';

const dir = mkdtempSync(join(tmpdir(), 'cycler-atlas-work-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const absurd = join(dir, 'absurd.yaml');
writeFileSync(absurd, `scenario: { name: Absurd, team: Test bench (invented), description: too much work }
systems: [{ preset: earth-moon }]
defaults:
  search: { gridPoints: 100000, jacobiLevels: 100, maxHalfCrossings: 64 }
families:
  - { system: earth-moon, signature: E1M1 }
  - { system: earth-moon, signature: E2M1 }
`);

describe('work estimate', () => {
  it('counts each shared grid once: two signatures of one system share theirs', () => {
    const { config, configPath } = loadConfig(absurd);
    const estimate = estimateDiscoveryWork(buildJobs(config, configPath));
    // 3 segments × 2 directions, each 100 levels × 100,000 points, 64 crossings.
    expect(estimate.grids).toBe(6);
    expect(estimate.gridPoints).toBe(6 * 100 * 100_000);
    expect(estimate.pointCrossings).toBe(6 * 100 * 100_000 * 64);
    expect(estimate.pointCrossings).toBeGreaterThan(MAX_GRID_WORK);
  });

  it('refuses absurd work in one line with the estimate, exit 2, and leaves the catalog as it was', async () => {
    const db = join(dir, 'absent.sqlite');
    const { code, stderr } = await runCommand(createGenerateCommand, [absurd, '--db', db]);
    expect(code).toBe(2);
    expect(stderr.trimEnd().split('\n')).toHaveLength(1);
    expect(stderr).toMatch(/discovery work: 6\.00e\+7 grid points × crossings = 3\.84e\+9 \(about [\d.]+ CPU-hours in 6 grids\) is above the allowed 2e\+8; .* or pass --force/);
    expect(catalogChecksum(db)).toBe('absent');
  });

  it('the demo config is well inside the bound', () => {
    const { config, configPath } = loadConfig(join(import.meta.dirname, '../../catalogs/demo.yaml'));
    expect(estimateDiscoveryWork(buildJobs(config, configPath)).pointCrossings).toBeLessThan(MAX_GRID_WORK / 10);
  });
});
