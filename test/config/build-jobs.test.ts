// buildJobs on the demo config: one job per entry in file order, stable keys, settings resolved
// from the entry, then the config's defaults, then the built-in defaults.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { buildJobs } from '../../generator/config/build-jobs.ts';
import { loadConfig } from '../../generator/config/load-config.ts';
import { singleFamilyConfig } from '../../generator/config/single-family-config.ts';
import { systemJacobiBounds } from '../../generator/config/system-jacobi-bounds.ts';
import { DEFAULT_LIMITS, DEFAULT_SEARCH, DEFAULT_TOLERANCE } from '../../generator/config/default-settings.ts';

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

  it('checks scan levels against C(L3) and C(L1) as tabulated in DESIGN.md', () => {
    const bounds = systemJacobiBounds(jobs[0]!.system.mu);
    // C(L1) = 3.188341105, C(L3) = 3.012147149 (DESIGN.md; quintic roots for this μ).
    expect(bounds.l1).toBeCloseTo(3.188341105, 8);
    expect(bounds.l3).toBeCloseTo(3.012147149, 8);
    for (const job of jobs) {
      if (job.seed.kind !== 'lap-signature') continue;
      const b = systemJacobiBounds(job.system.mu);
      for (const c of job.seed.jacobiValues) expect(c > b.l3 && c < b.l1).toBe(true);
    }
  });

  it('takes each setting from the entry, else the config defaults, else the built-in defaults', () => {
    const e1m1 = jobs[0]!;
    expect(e1m1.seed).toEqual({
      kind: 'lap-signature',
      signature: 'E1M1',
      jacobiValues: raw.defaults.search.jacobi,
      segments: raw.defaults.search.segments,
      directions: raw.defaults.search.directions,
      maxHalfCrossings: raw.defaults.search.maxHalfCrossings,
      gridPoints: raw.defaults.search.gridPoints,
    });
    expect(e1m1.limits).toMatchObject(raw.defaults.limits);
    expect(e1m1.limits.jacobiMax).toBeCloseTo(3.188341105, 8); // built-in: C(L1), the neck closes above it
    expect(e1m1.tolerance).toEqual(raw.tolerance);
    expect(e1m1.indexTolerance).toBe(raw.indexTolerance);
    const e3m3 = jobs[8]!;
    expect(e3m3.seed.kind === 'lap-signature' && e3m3.seed.maxHalfCrossings).toBe(raw.families[8].maxHalfCrossings);
    expect(jobs[9]!.seed).toEqual({ kind: 'lyapunov', point: 'L1', amplitudeNd: raw.families[9].amplitudeNd });
    expect(jobs[9]!.limits.maxMembers).toBe(raw.families[9].limits.maxMembers);
    expect(jobs[9]!.name).toBe('L1 Lyapunov');
    const pc = jobs[11]!;
    expect(pc.name).toBe(raw.families[11].name);
    expect(pc.seed.kind === 'lap-signature' && pc.seed.jacobiValues).toEqual(raw.families[11].jacobi);
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
