// Every family chart spec compiles with vega-lite (no warnings) and renders with vega to SVG; the marker
// position computed from the chart's own scales lands inside the picture.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { compile } from 'vega-lite';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { familyChartSpecs } from '../../site/charts/family-charts.ts';
import { symlogTicks } from '../../site/charts/chart-style.ts';
import { readCatalogSnapshot, type CatalogSnapshot } from '../../site/lib/catalog-source.ts';
import { familyChartInput } from '../../site/lib/family-chart-input.ts';
import { renderChart } from '../../site/lib/render-chart.ts';
import { writeSiteTestCatalog } from './site-test-catalog.ts';

let dir: string;
let catalog: CatalogSnapshot;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'chart-test-'));
  const path = join(dir, 'catalog.sqlite');
  writeSiteTestCatalog(path, { orbitCount: 30, familyCount: 2 });
  catalog = readCatalogSnapshot(path);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** vega-lite's logger interface; warnings would mean a layer or encoding was dropped. */
function collectingLogger(warnings: string[]) {
  const logger = {
    level: (_?: number) => logger as never,
    error: (...args: unknown[]) => { warnings.push(`error ${args.join(' ')}`); return logger; },
    warn: (...args: unknown[]) => { warnings.push(`warn ${args.join(' ')}`); return logger; },
    info: () => logger,
    debug: () => logger,
  };
  return logger;
}

describe('family charts', () => {
  it('every spec of every family compiles and renders to SVG', async () => {
    // the synthetic families have windows and bifurcations; the one-orbit Arenstorf family has neither
    expect(catalog.families.length).toBe(3);
    for (const family of catalog.families) {
      const input = familyChartInput(catalog, family.id);
      const specs = familyChartSpecs(input);
      expect(specs.map((s) => s.key)).toEqual(['stability', 'jacobi', 'period', 'vertical']);
      for (const chart of specs) {
        const warnings: string[] = [];
        compile(chart.spec as never, { logger: collectingLogger(warnings) as never });
        expect(warnings, `${family.id} ${chart.key}`).toEqual([]);
        const rendered = await renderChart(chart.spec);
        expect(rendered.svg.startsWith('<svg')).toBe(true);
        expect(rendered.svg).toContain('</svg>');
        expect(rendered.width).toBeGreaterThan(300);
        expect(chart.text.length).toBeGreaterThan(40);
        // one clickable point per member, linked to the member's page
        const links = rendered.svg.match(/<a [^>]*href="[^"]*\/orbit\/[^"]*"/g) ?? [];
        expect(links.length, `${family.id} ${chart.key}`).toBe(input.members.length);
      }
      // marker of each member of the stability chart lies inside the SVG's frame
      const stability = await renderChart(specs[0].spec);
      for (const m of input.members) {
        const [x, y] = stability.project(m.altKm, m.nu);
        expect(x).toBeGreaterThan(0);
        expect(x).toBeLessThan(stability.width);
        expect(y).toBeGreaterThan(0);
        expect(y).toBeLessThan(stability.height);
      }
    }
  });

  it('symlog ticks cover ν from 1e-1 to 1e8 with 0 and ±1 (the stable band edges)', () => {
    const ticks = symlogTicks([0.1, -3, 1e8]);
    expect(ticks).toContain(0);
    expect(ticks).toContain(1);
    expect(ticks).toContain(-1);
    expect(ticks).toContain(1e8);
    expect(Math.min(...ticks)).toBeGreaterThanOrEqual(-10);
    expect(ticks.length).toBeLessThan(12);
  });
});
