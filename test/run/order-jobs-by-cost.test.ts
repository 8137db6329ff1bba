import { describe, expect, it } from 'vitest';
import { loadConfig } from '../../generator/config/load-config.ts';
import { buildJobs } from '../../generator/config/build-jobs.ts';
import { estimatedJobCost, orderJobsByCost } from '../../generator/run/order-jobs-by-cost.ts';

describe('orderJobsByCost', () => {
  const loaded = loadConfig('catalogs/demo.yaml');
  const jobs = buildJobs(loaded.config, loaded.configPath);

  it('puts the costliest jobs first and keeps file order among equals (LPT scheduling, Graham 1969)', () => {
    const ordered = orderJobsByCost(jobs);
    expect(ordered).toHaveLength(jobs.length);
    expect(new Set(ordered.map((j) => j.key))).toEqual(new Set(jobs.map((j) => j.key)));
    for (let i = 1; i < ordered.length; i++) {
      const before = estimatedJobCost(ordered[i - 1]!), after = estimatedJobCost(ordered[i]!);
      expect(before).toBeGreaterThanOrEqual(after);
      if (before === after) expect(jobs.indexOf(ordered[i - 1]!)).toBeLessThan(jobs.indexOf(ordered[i]!));
    }
    // The reference families (one corrected seed each) are the cheapest and go last.
    expect(ordered.slice(-2).map((j) => j.seed.kind)).toEqual(['lyapunov', 'lyapunov']);
  });
});
