// Every family chart spec (the hold-radius one included) and the orbit page's section plot compile with
// vega-lite (no warnings) and render with vega to SVG; the marker position computed from the chart's own
// scales lands inside the picture; the section plot drawn at build as plain SVG puts its marks where vega
// puts them.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { compile } from 'vega-lite';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { familyChartSpecs, holdRadiusChartSpec } from '../../site/charts/family-charts.ts';
import { niceTicks } from '../../site/charts/nice-ticks.ts';
import { orbitPageData } from '../../site/lib/orbit-page-data.ts';
import { holdRadiusChartInput } from '../../site/lib/hold-radius-chart-input.ts';
import { sectionPlotOf } from '../../site/lib/section-plot-of-orbit.ts';
import { symlogTicks } from '../../site/charts/chart-style.ts';
import { zoomSpanJacobi, zoomSpanKm } from '../../site/charts/window-zoom-chart.ts';
import { zoomAxisOf, zoomSpec } from '../../site/charts/zoom-spec.ts';
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
      const zoom = input.windows.length > 0 ? ['windows'] : [];
      expect(specs.map((s) => s.key)).toEqual(['stability', ...zoom, 'jacobi', 'period', 'vertical']);
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
        if (chart.key !== 'windows') expect(links.length, `${family.id} ${chart.key}`).toBe(input.members.length);
        else expect(links.length).toBeGreaterThan(0);
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

  it('each chart says what its colours mean, and the vertical-index chart colours and labels by |ν_z| < 1', async () => {
    const family = catalog.families.find((f) => f.memberCount > 5)!;
    const input = familyChartInput(catalog, family.id);
    // a member stable in-plane but not vertically, and one the other way round (made up for this check)
    const members = input.members.map((m, i) => (i === 0 ? { ...m, nu: 0.5, nuV: 3 } : i === 1 ? { ...m, nu: 3, nuV: 0.5 } : m));
    const specs = familyChartSpecs({ ...input, members });
    const byKey = Object.fromEntries(specs.map((s) => [s.key, s]));
    const classOf = (key: string, seq: number) => {
      const layers = byKey[key].spec.layer as Array<{ data?: { values?: Array<{ seq?: number; cls?: string; nu?: number }> } }>;
      const rows = layers.flatMap((l) => l.data?.values ?? []).filter((v) => v.cls !== undefined && v.nu !== undefined);
      return rows.find((v) => v.seq === seq)!.cls;
    };
    expect(classOf('vertical', members[0].seq)).toMatch(/^vertically unstable/);
    expect(classOf('vertical', members[1].seq)).toMatch(/^vertically stable/);
    for (const key of ['stability', 'jacobi', 'period']) {
      expect(classOf(key, members[0].seq)).toMatch(/^in-plane stable/);
      expect(classOf(key, members[1].seq)).toMatch(/^in-plane unstable/);
    }
    expect(byKey.vertical.legend).toContain('blue circles: vertically stable (|ν_z| < 1)');
    expect(byKey.vertical.legend).not.toMatch(/in-plane stable/);
    expect(byKey.stability.legend).toContain('blue circles: in-plane stable (|ν| < 1)');
    // the picture's own legend uses the same words as the text beside it
    const svg = (await renderChart(byKey.vertical.spec)).svg;
    expect(svg).toContain('vertically stable (|ν_z| &lt; 1)');
    expect(svg).not.toContain('in-plane stable');
  });

  it('the hold-radius chart of each screened family compiles, renders, links every screened member and places it in its window', async () => {
    let families = 0;
    for (const family of catalog.families) {
      const input = holdRadiusChartInput(catalog, family.id);
      const rows = catalog.holdRadiiByFamily.get(family.id) ?? [];
      if (rows.length === 0) {
        expect(input).toBeNull();
        continue;
      }
      families++;
      expect(input!.points.map((p) => p.holdKm)).toEqual(rows.map((r) => r.holdRadiusKm));
      // each point's window is the stable window whose arclength span holds the member
      const windows = catalog.windowsByFamily.get(family.id) ?? [];
      for (const p of input!.points) {
        const orbit = catalog.orbitById.get(p.id)!;
        if (p.window === null) expect(windows.every((w) => orbit.arclength < w.fromArclength || orbit.arclength > w.toArclength)).toBe(true);
        else {
          expect(orbit.arclength).toBeGreaterThanOrEqual(windows[p.window].fromArclength);
          expect(orbit.arclength).toBeLessThanOrEqual(windows[p.window].toArclength);
        }
      }
      const chart = holdRadiusChartSpec(input!);
      const warnings: string[] = [];
      compile(chart.spec as never, { logger: collectingLogger(warnings) as never });
      expect(warnings).toEqual([]);
      const rendered = await renderChart(chart.spec);
      const links = rendered.svg.match(/<a [^>]*href="[^"]*\/orbit\/[^"]*"/g) ?? [];
      expect(links.length).toBe(rows.length);
      expect(chart.text).toMatch(/^Hold radius against minimum altitude/);
      expect(chart.text).toContain(`${rows.length} member${rows.length === 1 ? '' : 's'} with a hold radius`);
    }
    expect(families).toBe(2);
  });

  it("the section plot's spec compiles and renders, and the build's plain SVG puts the marks where vega puts them", async () => {
    const screened = catalog.holdRadii.slice(0, 4);
    expect(screened.length).toBe(4);
    for (const row of screened) {
      const page = orbitPageData(catalog, row.orbitId);
      const plot = sectionPlotOf(page.screening.holdRadius!, `member #${page.orbit.seq}`);
      const warnings: string[] = [];
      compile(plot.spec as never, { logger: collectingLogger(warnings) as never });
      expect(warnings).toEqual([]);
      const rendered = await renderChart(plot.spec);
      expect(rendered.svg).toContain('x on the section, rotating frame (km from the barycentre)');
      expect(rendered.svg).toContain('ẋ on the section (m/s)');
      // Same data window: pixel offsets between marks agree (vega's plot origin differs from ours).
      const f = plot.input.fixedPoint;
      const [vx0, vy0] = rendered.project(f.xKm, f.vxMS);
      const [vx1] = rendered.project(f.xKm + plot.input.holdRadiusKm, f.vxMS);
      const p = plot.input.points[3];
      const [vpx, vpy] = rendered.project(p.xKm, p.vxMS);
      const { figure } = plot;
      expect(figure.radius!.x2 - figure.radius!.x1).toBeCloseTo(vx1 - vx0, 0);
      const drawn = /M([\d.]+) ([\d.]+)h0/g;
      const marks = [...figure.pointsD.matchAll(drawn)].map((m) => [Number(m[1]), Number(m[2])]);
      expect(marks.length).toBe(plot.input.points.length);
      expect(marks[3][0] - figure.fixed[0]).toBeCloseTo(vpx - vx0, 0);
      expect(marks[3][1] - figure.fixed[1]).toBeCloseTo(vpy - vy0, 0);
      // the ticks drawn are the values vega labels
      expect(figure.xTicks.length).toBe(niceTicks(...(plot.spec.layer as Array<{ encoding: { x: { scale: { domain: [number, number] } } } }>)[0].encoding.x.scale.domain, 4).length);
      expect(plot.text).toContain(`${plot.input.points.length} stored points`);
    }
  });

  it('a zero hold radius with no stored curve (what an orbit at the edge of stability gets) still compiles and draws the fixed point', async () => {
    const plot = sectionPlotOf({
      holdRadiusKm: 0, holdRadiusNd: 0, failingDisplacementKm: 0.4, returns: 200, rotationPerReturnDeg: null,
      fixedPoint: { xKm: 321_456.7, vxMS: 0 }, points: [],
    }, 'member #7');
    const warnings: string[] = [];
    compile(plot.spec as never, { logger: collectingLogger(warnings) as never });
    expect(warnings).toEqual([]);
    const rendered = await renderChart(plot.spec);
    expect(rendered.svg).toContain('<path');
    expect(plot.figure.radius).toBeNull();
    expect(plot.figure.pointsD).toBe('');
    expect(plot.figure.xTicks.length).toBeGreaterThanOrEqual(2);
    expect(plot.text).toMatch(/No curve points are stored\.$/);
  });

  it('scales come from the data: collision approaches folded in, plain km ticks, a close-up per window, no point on the frame, no colliding labels', async () => {
    // A made-up family (numbers invented for this check, shaped like a family that starts at a collision):
    // altitudes from 2 m to 50,000 km, one stable window at 400–590 km, ν down to −2.7, ν_z just above 1.
    const n = 120;
    const members = Array.from({ length: n }, (_, i) => {
      const altKm = 0.002 * (50_000 / 0.002) ** (i / (n - 1));
      const inWindow = altKm >= 400 && altKm <= 590;
      return {
        id: `made-up/${i}`, seq: i, href: `/orbit/made-up/${i}/`, altKm,
        nu: inWindow ? 0.5 : i % 7 === 0 ? -2.7 : 1 + altKm / 10, nuV: 0.99 + 0.0103 * (i / (n - 1)),
        jacobi: 3.0 + 0.15 * (i / (n - 1)), periodDays: 12 + 20 * (i / (n - 1)),
      };
    });
    const input = { secondaryName: 'Moon', members, windows: [{ fromAltKm: 400, toAltKm: 590, fromJacobi: 3.05, toJacobi: 3.06 }], bifurcations: [] };
    const specs = Object.fromEntries(familyChartSpecs(input).map((s) => [s.key, s]));
    const stability = await renderChart(specs.stability.spec);
    const xAt = (altKm: number) => stability.project(altKm, 0)[0];
    // nothing of the width goes to sub-kilometre approaches (the old log axis from 2 m gave them 37 %)
    expect(xAt(1)).toBe(xAt(0.002));
    expect(xAt(590) - xAt(400)).toBeGreaterThan(0.035 * (xAt(50_000) - xAt(0.002)));
    const labels = (svg: string) => [...svg.matchAll(/role-axis-label[^]*?<\/g>/g)].flatMap((g) => [...g[0].matchAll(/<text[^>]*transform="translate\(([-\d.]+),([-\d.]+)\)"[^>]*>([^<]*)<\/text>/g)])
      .map((m) => ({ x: Number(m[1]), y: Number(m[2]), text: m[3]! }));
    for (const label of labels(stability.svg)) expect(label.text, 'no SI-prefixed ticks').not.toMatch(/[µmkM]$/);
    // a tick below −1 where ν reaches −2.7
    const yAxis = (specs.stability.spec.layer as Array<{ encoding: { y?: { axis?: { values?: number[] } } } }>)[0].encoding.y!.axis!.values!;
    expect(yAxis.some((v) => v < -1 && v >= -2.7)).toBe(true);
    // the close-up gives the window two thirds of its panel (a quarter of its width each side)
    const panel = (specs.windows.spec as { concat: Array<{ layer: Array<{ encoding: { x?: { scale?: { domain?: [number, number] } } } }> }> }).concat[0]!;
    const [lo, hi] = panel.layer.find((l) => l.encoding.x?.scale?.domain)!.encoding.x!.scale!.domain!;
    expect((590 - 400) / (hi - lo)).toBeGreaterThan(0.6);
    // the highest ν_z sits inside the plot, not on its top edge
    const vertical = await renderChart(specs.vertical.spec);
    const top = Number(/transform="translate\(([-\d.]+),([-\d.]+)\)"/.exec(vertical.svg)![2]);
    const verticalTicks = labels(vertical.svg).filter((l) => l.x < 0).map((l) => l.text); // the y axis' labels, left of the plot
    expect(verticalTicks.length).toBeGreaterThan(2);
    expect(new Set(verticalTicks).size, verticalTicks.join(' ')).toBe(verticalTicks.length);
    expect(vertical.project(members[n - 1]!.altKm, members[n - 1]!.nuV)[1] - top).toBeGreaterThanOrEqual(5);
    // period chart: neighbouring x labels do not overlap (about 6 px per character at the 10 px axis font, common practice)
    const period = await renderChart(specs.period.spec);
    const rows = new Map<number, Array<{ x: number; text: string }>>();
    for (const l of labels(period.svg)) rows.set(l.y, [...(rows.get(l.y) ?? []), l]);
    const xLabels = [...rows.values()].sort((a, b) => b.length - a.length)[0]!.sort((a, b) => a.x - b.x);
    expect(xLabels.length).toBeGreaterThan(2);
    for (let i = 1; i < xLabels.length; i++) {
      expect(xLabels[i]!.x - xLabels[i - 1]!.x, `${xLabels[i - 1]!.text} / ${xLabels[i]!.text}`).toBeGreaterThan(3 * (xLabels[i]!.text.length + xLabels[i - 1]!.text.length));
    }
  });

  it('zooming a chart onto a stable window gives the window most of the width and leaves the spec as it was', async () => {
    const family = catalog.families.find((f) => (catalog.windowsByFamily.get(f.id) ?? []).length > 0)!;
    const input = familyChartInput(catalog, family.id);
    const specs = Object.fromEntries(familyChartSpecs(input).map((s) => [s.key, s.spec]));
    expect([zoomAxisOf(specs.stability), zoomAxisOf(specs.jacobi), zoomAxisOf(specs.vertical), zoomAxisOf(specs.period), zoomAxisOf(specs.windows)])
      .toEqual(['altKm', 'altKm', 'altKm', 'jacobi', null]);
    const w = [...input.windows].sort((a, b) => Math.abs(b.toAltKm - b.fromAltKm) - Math.abs(a.toAltKm - a.fromAltKm))[0]!; // the widest
    expect(Math.abs(w.toAltKm - w.fromAltKm)).toBeGreaterThan(10);
    const before = JSON.stringify(specs.stability);
    const zoomed = await renderChart(zoomSpec(specs.stability, zoomSpanKm(w)));
    expect(JSON.stringify(specs.stability)).toBe(before);
    const [lo, hi] = zoomSpanKm(w);
    const share = (zoomed.project(Math.max(w.fromAltKm, w.toAltKm), 0)[0] - zoomed.project(Math.min(w.fromAltKm, w.toAltKm), 0)[0])
      / (zoomed.project(hi, 0)[0] - zoomed.project(lo, 0)[0]);
    expect(share).toBeGreaterThan(0.6);
    const full = await renderChart(specs.stability);
    const fullShare = (full.project(Math.max(w.fromAltKm, w.toAltKm), 0)[0] - full.project(Math.min(w.fromAltKm, w.toAltKm), 0)[0]) / full.width;
    expect(share).toBeGreaterThan(fullShare);
    const period = await renderChart(zoomSpec(specs.period, zoomSpanJacobi(w)));
    expect(period.svg).toContain('</svg>');
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
