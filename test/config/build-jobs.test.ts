// buildJobs: on the demo config one job per entry in file order with stable keys, the same jobs as the
// one-signature command; on a test config, settings resolved from the entry, then the config's
// defaults, then the built-in defaults.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { buildJobs } from '../../generator/config/build-jobs.ts';
import { loadConfig } from '../../generator/config/load-config.ts';
import { singleFamilyConfig } from '../../generator/config/single-family-config.ts';
import { systemJacobiBounds } from '../../generator/config/system-jacobi-bounds.ts';
import { DEFAULT_LIMITS, DEFAULT_SEARCH, DEFAULT_TOLERANCE } from '../../generator/config/default-settings.ts';
import { validateConfig } from '../../generator/config/validate-config.ts';
import { validConfigObject } from './valid-config-object.ts';

const demoPath = new URL('../../catalogs/demo.yaml', import.meta.url).pathname;

describe('buildJobs(demo config)', () => {
  const loaded = loadConfig(demoPath);
  const jobs = buildJobs(loaded.config, loaded.configPath);
  // Read the YAML independently of the config layer, to compare against what the file says.
  const raw = parse(readFileSync(demoPath, 'utf8'));

  it('has one job per family entry, in file order, with stable keys', () => {
    expect(jobs.map((j) => j.key)).toEqual([
      'earth-moon:E1M1', 'earth-moon:E1M2', 'earth-moon:E1M3',
      'earth-moon:E2M1', 'earth-moon:E2M2', 'earth-moon:E2M3',
      'earth-moon:E3M1', 'earth-moon:E3M2', 'earth-moon:E3M3',
      'earth-moon:L1-lyapunov', 'earth-moon:L2-lyapunov',
      'pluto-charon:P3C1',
    ]);
    expect(jobs).toHaveLength(raw.families.length);
    expect(loadConfig(demoPath).config).toEqual(loaded.config); // same file, same jobs: keys do not drift
  });

  it('resolves the Earth–Moon system from its preset', () => {
    const em = jobs[0]!.system;
    // μ = 0.0121505842695 and TU = 375190.262 s from the DE430 GMs (DESIGN.md constants table, from memory).
    expect(em.mu).toBeCloseTo(0.0121505842695, 12);
    expect(em.timeUnitS).toBeCloseTo(375190.262, 2);
    expect(em.lengthUnitKm).toBe(384400); // common practice
    expect([em.primaryLetter, em.secondaryLetter]).toEqual(['E', 'M']);
    // Pluto–Charon μ ≈ 0.1085 (DESIGN.md, from memory).
    expect(jobs[11]!.system.mu).toBeCloseTo(0.1085, 3);
  });

  it('checks the equilibria against DESIGN.md and puts the discovery levels below C(L1)', () => {
    const bounds = systemJacobiBounds(jobs[0]!.system.mu);
    // C(L1) = 3.188341105, C(L3) = 3.012147149 (DESIGN.md; quintic roots for this μ).
    expect(bounds.l1).toBeCloseTo(3.188341105, 8);
    expect(bounds.l3).toBeCloseTo(3.012147149, 8);
    for (const job of jobs) {
      if (job.seed.kind !== 'lap-signature') continue;
      const b = systemJacobiBounds(job.system.mu);
      for (const c of job.seed.jacobiValues) expect(c >= job.limits.jacobiMin && c < b.l1).toBe(true);
    }
  });

  it('builds every lap-signature job of the demo exactly as the one-signature command does', () => {
    // The demo uses the built-in discovery and continuation settings, so `generate --system earth-moon
    // --signature X` runs the same job for X (only the screening's members per window differ).
    for (const job of jobs.filter((j) => j.seed.kind === 'lap-signature' && j.system.id === 'earth-moon')) {
      const signature = (job.seed as { signature: string }).signature;
      const single = singleFamilyConfig({ system: 'earth-moon', signature });
      const [alone] = buildJobs(single.config, single.configPath);
      expect({ ...alone!, screening: undefined }).toEqual({ ...job, screening: undefined });
    }
  });

  it('takes each setting from the entry, else the config defaults, else the built-in defaults', () => {
    const config = validConfigObject();
    config.families[0].maxHalfCrossings = 4;
    delete config.defaults.search.gridPoints;
    const built = buildJobs(validateConfig(config, 'test config'), 'test config');
    expect(built[0]!.seed).toEqual({
      kind: 'lap-signature',
      signature: 'E2M1',
      jacobiValues: [3.1, 3.15], // the entry's
      segments: config.defaults.search.segments, // the config's defaults
      directions: config.defaults.search.directions,
      maxHalfCrossings: 4, // the entry's
      gridPoints: DEFAULT_SEARCH.gridPoints, // built in
    });
    expect(built[0]!.limits).toMatchObject(config.defaults.limits);
    expect(built[0]!.limits.jacobiMax).toBeCloseTo(3.188341105, 8); // built-in: C(L1), the neck closes above it
    expect(built[3]!.seed.kind === 'lap-signature' && built[3]!.seed.jacobiValues).toEqual([3.3]);
    expect(jobs[9]!.seed).toEqual({ kind: 'lyapunov', point: 'L1', amplitudeNd: raw.families[9].amplitudeNd });
    expect(jobs[9]!.name).toBe('L1 Lyapunov');
    expect(jobs[11]!.name).toBe(raw.families[11].name);
  });

  it('builds the one-family command-line config from the same built-in defaults', () => {
    const single = singleFamilyConfig({ system: 'earth-moon', signature: 'E2M1' });
    const [job] = buildJobs(single.config, single.configPath);
    expect(job!.key).toBe('earth-moon:E2M1');
    expect(job!.tolerance).toEqual(DEFAULT_TOLERANCE);
    expect(job!.limits).toMatchObject(DEFAULT_LIMITS);
    expect(job!.seed).toMatchObject({ segments: DEFAULT_SEARCH.segments, gridPoints: DEFAULT_SEARCH.gridPoints });
    const b = systemJacobiBounds(job!.system.mu);
    const levels = job!.seed.kind === 'lap-signature' ? job!.seed.jacobiValues : [];
    expect(levels.length).toBeGreaterThan(0);
    // The grid reaches from the family's lowest C up to just below C(L1), denser toward C(L1).
    expect(levels.length).toBe(DEFAULT_SEARCH.jacobiLevels);
    expect(levels[0]).toBeCloseTo(job!.limits.jacobiMin, 12);
    expect(b.l1 - levels[levels.length - 1]!).toBeCloseTo(DEFAULT_SEARCH.jacobiGapBelowL1, 12);
    for (let i = 2; i < levels.length; i++) expect(levels[i]! - levels[i - 1]!).toBeLessThan(levels[i - 1]! - levels[i - 2]!);
    const retro = singleFamilyConfig({ system: 'earth-moon', lyapunov: 'L2', maxMembers: 7 });
    expect(buildJobs(retro.config, retro.configPath)[0]).toMatchObject({ key: 'earth-moon:L2-lyapunov', limits: { maxMembers: 7 } });
  });
});
