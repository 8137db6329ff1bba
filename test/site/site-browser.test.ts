// The built site in a real browser (Debian's chromium through playwright-core), served from 127.0.0.1
// under a base path. Builds its own small catalog: synthetic families (with synthetic screenings) for the
// non-physics checks and the Arenstorf orbit (Hairer, Nørsett & Wanner 1993, §II.0) for the closure check
// and the dated downloads, which must equal what `export-state` writes in Node for the same request (the
// CLI's own states are checked against astronomy-engine in test/beyond-integration/export-state.test.ts).
import Database from 'better-sqlite3';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runExportState } from '../../generator/cli/commands/export-state.ts';
import { idToPath } from '../../site/lib/id-path.ts';
import { formatStabilityIndex } from '../../site/format/format-stability-index.ts';
import { queryToState } from '../../site/scripts/finder/finder-query.ts';
import { buildSite, REPO_ROOT } from './build-site.ts';
import { builtPages } from './built-pages.ts';
import { finderSql } from './finder-sql.ts';
import { launchChromium } from './launch-chromium.ts';
import { parseOem } from './parse-oem.ts';
import { ARENSTORF, HOSTILE_SCENARIO, HOSTILE_TEXT, writeSiteTestCatalog } from './site-test-catalog.ts';
import { serveStatic, type StaticSite } from './static-server.ts';

const BASE = '/atlas/';
/** Every end reason the generator stores (the EndReason type of generator/core/orbits/continue-family.ts). */
const ALL_END_REASONS = ['member-limit', 'jacobi-range', 'period-limit', 'collision-primary', 'collision-secondary', 'brake-orbit',
  'signature-change', 'lost-l1-passage', 'precision-limit', 'no-convergence', 'unstable-far-from-windows', 'closed-loop', 'joins-family', 'interrupted'];
const ARTIFACTS = join(REPO_ROOT, 'test-artifacts');

let dir: string;
let dbPath: string;
let arenstorfId: string;
let site: StaticSite;
let browser: Browser;
let context: BrowserContext;
const requests: string[] = [];
const pageErrors: string[] = [];

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'site-browser-'));
  dbPath = join(dir, 'catalog.sqlite');
  arenstorfId = writeSiteTestCatalog(dbPath, { orbitCount: 40, familyCount: 2 }).arenstorfOrbitId;
  await buildSite({ dbPath, outDir: join(dir, 'dist'), base: BASE });
  site = await serveStatic(join(dir, 'dist'), BASE);
  mkdirSync(ARTIFACTS, { recursive: true });
  browser = await launchChromium();
  context = await browser.newContext({ acceptDownloads: true, viewport: { width: 1280, height: 900 } });
  context.on('request', (request) => requests.push(request.url()));
}, 300_000);

afterAll(async () => {
  await browser?.close();
  await site?.close();
  if (dir) rmSync(dir, { recursive: true, force: true });
});

async function open(path: string, ctx: BrowserContext = context): Promise<Page> {
  const page = await ctx.newPage();
  page.on('pageerror', (error) => pageErrors.push(`${path}: ${error.message}`));
  const response = await page.goto(site.root + path);
  expect(response?.status(), path).toBe(200);
  return page;
}

async function downloadText(page: Page, click: () => Promise<void>): Promise<string> {
  const [download] = await Promise.all([page.waitForEvent('download'), click()]);
  const path = await download.path();
  return readFileSync(path!, 'utf8');
}

const orbitPath = (id: string) => `orbit/${idToPath(id)}/`;

/** A family page's charts become interactive on the first pointer over them (the runtime loads then). */
async function chartsMadeInteractive(page: Page, key: string): Promise<void> {
  await page.locator('#family-charts .chart-host').first().hover();
  await page.waitForSelector(`[data-chart-key="${key}"][data-interactive="true"]`);
}
const familyPath = (id: string) => `family/${idToPath(id)}/`;

describe('built site in chromium', () => {
  it('renders each page type (screenshots in test-artifacts/)', async () => {
    const pages: Array<[string, string]> = [
      ['home', ''],
      ['finder', 'finder/'],
      ['family', familyPath('earth-moon/E1M1/a')],
      ['orbit', orbitPath(arenstorfId)],
      ['orbit-screened', orbitPath(screenedOrbit().orbit_id)],
    ];
    for (const [name, path] of pages) {
      const page = await open(path);
      if (name === 'finder') await page.waitForSelector('#finder[data-ready="true"]');
      if (name === 'family') await chartsMadeInteractive(page, 'stability');
      await page.screenshot({ path: join(ARTIFACTS, `site-${name}.png`), fullPage: true });
      await page.close();
    }
    expect(pageErrors).toEqual([]);
  });

  it("the finder's filtered rows equal the same query run in SQLite", async () => {
    const query = 'sys=earth-moon&cmin=3.04&a2max=20000&vert=stable';
    const page = await open(`finder/?${query}`);
    await page.waitForSelector('#finder[data-ready="true"]');
    const db = new Database(dbPath, { readonly: true });
    const expectIds = (q: string) => {
      const { sql, params } = finderSql(queryToState(q).filter);
      return (db.prepare(sql).all(...params) as Array<{ id: string }>).map((r) => r.id);
    };
    try {
      const expected = expectIds(query);
      expect(expected.length).toBeGreaterThan(3);
      expect(expected.length).toBeLessThan(41);
      expect(await page.locator('#finder-count').getAttribute('data-count')).toBe(String(expected.length));
      const json = JSON.parse(await downloadText(page, () => page.click('#finder-json')));
      expect(json.orbits.map((o: { orbitId: string }) => o.orbitId)).toEqual(expected);
      const csv = (await downloadText(page, () => page.click('#finder-csv'))).trim().split('\r\n').filter((line) => !line.startsWith('#'));
      const idColumn = csv[0].split(',').indexOf('orbitId');
      expect(csv.slice(1).map((line) => line.split(',')[idColumn])).toEqual(expected);
      // the visible rows are the first ones of the same set
      const shown = await page.locator('#finder-rows tr').evaluateAll((rows) => rows.map((r) => (r as HTMLElement).dataset.id));
      expect(shown).toEqual(expected.slice(0, shown.length));

      // typing a bound updates the count at once and the URL keeps the filter
      await page.fill('input[name="pmin"]', '25');
      const typed = expectIds(`${query}&pmin=25`);
      await expect.poll(() => page.locator('#finder-count').getAttribute('data-count')).toBe(String(typed.length));
      expect(new URL(page.url()).searchParams.get('pmin')).toBe('25');
      const reopened = await open(`finder/${new URL(page.url()).search}`);
      await reopened.waitForSelector('#finder[data-ready="true"]');
      expect(await reopened.locator('#finder-count').getAttribute('data-count')).toBe(String(typed.length));
      expect(await reopened.inputValue('input[name="pmin"]')).toBe('25');
      await reopened.close();
    } finally {
      db.close();
    }
    await page.close();
  });

  it('an orbit page shows its numbers', async () => {
    const db = new Database(dbPath, { readonly: true });
    const row = db.prepare('SELECT * FROM orbits WHERE id = ?').get(arenstorfId) as Record<string, number | string>;
    db.close();
    const page = await open(orbitPath(arenstorfId));
    const field = (name: string) => page.locator(`#orbit-numbers [data-field="${name}"]`).innerText();
    expect(await field('jacobi')).toBe(String(row.jacobi));
    expect(await field('period')).toBe(`${row.period} TU`);
    expect(await field('periodDays')).toContain(Number(row.period_days).toFixed(6));
    expect(await field('stabilityIndex')).toBe(formatStabilityIndex(Number(row.stability_index)));
    const state = await page.locator('#initial-state td[data-nd]').evaluateAll((cells) => cells.map((c) => Number((c as HTMLElement).innerText)));
    expect(state).toEqual(JSON.parse(String(row.state0)));
    expect(await page.locator('.plots svg path').count()).toBeGreaterThanOrEqual(6);
    await page.close();
  });

  it('a CSV download over one period starts at the initial state and ends within 1e-8 of it; the OEM parses to the same states', async () => {
    const page = await open(orbitPath(arenstorfId));
    await page.fill('input[name="periods"]', '1');
    await page.selectOption('select[name="stepUnit"]', 'tu');
    await page.fill('input[name="step"]', String(ARENSTORF.periodNd / 300));
    await page.selectOption('select[name="frame"]', 'rotating');
    await page.selectOption('select[name="units"]', 'nd');
    const csvRows = (text: string) => text.split('\r\n').filter((line) => line !== '' && !line.startsWith('#')).slice(1)
      .map((line) => line.split(',').slice(1).map(Number)); // without the epoch
    const rows = csvRows(await downloadText(page, () => page.click('button[data-format="csv"]')));
    expect(rows.length).toBe(301);
    const state0 = [ARENSTORF.x0, 0, 0, 0, ARENSTORF.vy0, 0];
    expect(rows[0]).toEqual([0, ...state0]);
    const last = rows[rows.length - 1];
    expect(last[0]).toBeCloseTo(ARENSTORF.periodNd, 12);
    last.slice(1).forEach((v, i) => expect(Math.abs(v - state0[i])).toBeLessThan(1e-8));

    // OEM (km, km/s) against the CSV in km from the same page, inertial frame about the Moon
    await page.selectOption('select[name="frame"]', 'inertial-secondary');
    await page.selectOption('select[name="units"]', 'km');
    const kmRows = csvRows(await downloadText(page, () => page.click('button[data-format="csv"]')));
    const oem = parseOem(await downloadText(page, () => page.click('button[data-format="oem"]')));
    expect(oem.header.CCSDS_OEM_VERS).toBe('3.0');
    expect(oem.meta.CENTER_NAME).toBe('MOON');
    expect(oem.comments.join(' ')).toMatch(/APPROXIMATION: states in a CR3BP model frame/);
    expect(oem.states.length).toBe(kmRows.length);
    oem.states.forEach((state, i) => expect(state).toEqual(kmRows[i].slice(1)));
    const note = await page.locator('[data-role="download-note"]').innerText();
    expect(note).toMatch(/^301 states/);
    await page.close();
  });

  it('names with markup and quotes show as text', async () => {
    const home = await open('');
    expect(await home.locator('h1').innerText()).toBe(HOSTILE_SCENARIO);
    expect(await home.locator('#families').locator('xpath=following::table[1]').innerText()).toContain(HOSTILE_TEXT);
    const family = await open(familyPath(queryFamilyId()));
    expect(await family.locator('h1').innerText()).toBe(HOSTILE_TEXT);
    const orbit = await open(orbitPath(arenstorfId));
    expect(await orbit.locator('.crumbs').innerText()).toContain(HOSTILE_TEXT);
    const finder = await open(`finder/?fam=${encodeURIComponent(queryFamilyId())}`);
    await finder.waitForSelector('#finder[data-ready="true"]');
    expect(await finder.locator('#finder-rows tr').first().innerText()).toContain(HOSTILE_TEXT);
    for (const page of [home, family, orbit, finder]) {
      expect(await page.evaluate(() => (window as unknown as { __injected?: number }).__injected)).toBeUndefined();
      await page.close();
    }
  });

  it('chart points show values on hover and open the orbit page on click', async () => {
    const page = await open(familyPath('earth-moon/E1M1/a'));
    await chartsMadeInteractive(page, 'stability');
    const point = page.locator('[data-chart-key="stability"] g.mark-symbol.role-mark path').first();
    await point.hover();
    await page.waitForSelector('#vg-tooltip-element.visible');
    expect(await page.locator('#vg-tooltip-element').innerText()).toMatch(/in-plane index ν/);
    await Promise.all([page.waitForURL(/\/atlas\/orbit\/earth-moon\/E1M1\/a\/\d{4}\/$/), point.click()]);
    await page.close();
  });

  it('every link and asset stays under the base path and resolves', async () => {
    const paths = ['', 'finder/', familyPath('earth-moon/E1M1/a'), orbitPath('earth-moon/E1M1/a/0003'), orbitPath(arenstorfId)];
    const urls = new Set<string>();
    for (const path of paths) {
      const page = await open(path);
      const found = await page.evaluate(() =>
        Array.from(document.querySelectorAll('[href], [src]')).map((el) => (el as HTMLAnchorElement).href || (el as HTMLImageElement).src)
          .concat(Array.from(document.querySelectorAll('svg a')).map((a) => new URL(a.getAttribute('href') ?? a.getAttribute('xlink:href') ?? '', location.href).href)),
      );
      for (const url of found) if (url.startsWith('http')) urls.add(url.split('#')[0]);
      await page.close();
    }
    expect(urls.size).toBeGreaterThan(20);
    for (const url of urls) {
      expect(url.startsWith(site.root), url).toBe(true);
      const response = await context.request.get(url);
      expect(response.status(), url).toBe(200);
    }
  });

  it('reads fine with JavaScript off', async () => {
    const noScript = await browser.newContext({ javaScriptEnabled: false });
    const family = await open(familyPath('earth-moon/E1M1/a'), noScript);
    const pictures = family.locator('#family-charts .chart-host img');
    expect(await pictures.count()).toBe(6); // four, the window close-up and the hold radius
    for (const img of await pictures.all()) {
      await img.scrollIntoViewIfNeeded();
      await expect.poll(() => img.evaluate((el) => (el as HTMLImageElement).complete && (el as HTMLImageElement).naturalWidth)).toBeGreaterThan(300);
    }
    const screened = await open(orbitPath(screenedOrbit().orbit_id), noScript);
    expect(await screened.locator('#section-plot svg path').count()).toBeGreaterThan(3);
    const orbit = await open(orbitPath(arenstorfId), noScript);
    expect(await orbit.locator('.plots svg').count()).toBe(3);
    expect(await orbit.locator('#initial-state-download').getAttribute('href')).toMatch(/^data:application\/json/);
    const finder = await open('finder/', noScript);
    expect(await finder.locator('#finder-rows tr').count()).toBe(41);
    await noScript.close();
  });

  it("a screened member's page shows its hold radius, section plot and screenings as stored; an unscreened one says so", async () => {
    const row = screenedOrbit();
    const db = new Database(dbPath, { readonly: true });
    const screenings = db.prepare('SELECT * FROM model_screenings WHERE orbit_id = ? ORDER BY model').all(row.orbit_id) as Array<Record<string, string | number>>;
    db.close();
    expect(screenings.map((m) => m.model)).toEqual(['bicircular', 'elliptic']);
    const page = await open(orbitPath(row.orbit_id));
    const km = Number((await page.locator('[data-field="holdRadiusKm"]').innerText()).replace(/[^\d.]/g, ''));
    expect(Math.abs(km - row.hold_radius_km)).toBeLessThanOrEqual(0.05);
    expect(await page.locator('[data-field="curvePoints"]').innerText()).toBe(String(JSON.parse(row.curve_x).length));
    for (const m of screenings) {
      const block = page.locator(`.screening[data-model="${m.model}"]`);
      expect(await block.locator('[data-field="survivingFraction"]').getAttribute('data-value')).toBe(String(m.surviving_fraction));
      const broken = JSON.parse(String(m.first_broken_periods)) as Array<number | null>;
      const cells = await block.locator('tbody tr td:nth-child(2)').allInnerTexts();
      expect(cells).toEqual(broken.map((p) => (p === null ? 'held for the whole span' : `period ${p}`)));
      const phases = await block.locator('tbody tr td:nth-child(1)').allInnerTexts();
      expect(phases.map(Number)).toEqual((JSON.parse(String(m.phase_rad)) as number[]).map((r) => Number(((r * 180) / Math.PI).toFixed(1))));
    }
    const plot = page.locator('#section-plot [role="img"]');
    expect(await plot.getAttribute('aria-label')).toMatch(/^Return-map section of member #\d+, x against ẋ\. Fixed point/);
    // the interactive version (vega, bundled) replaces the build's SVG once the figure is in view
    await plot.scrollIntoViewIfNeeded();
    await expect.poll(() => plot.getAttribute('data-interactive')).toBe('true');
    expect(await plot.locator('svg text', { hasText: 'ẋ on the section (m/s)' }).count()).toBe(1);
    await page.close();

    const unscreened = await open(orbitPath(arenstorfId));
    expect(await unscreened.locator('#screening').getAttribute('data-screened')).toBe('false');
    expect(await unscreened.locator('#screening-status').innerText()).toMatch(/^Not screened\. Only in-plane stable members get a hold radius/);
    await unscreened.close();
  });

  it('a family page charts the hold radius and lists its branch points of spatial families with working links', async () => {
    const page = await open(familyPath('earth-moon/E1M1/a'));
    await chartsMadeInteractive(page, 'hold');
    expect(await page.locator('[data-chart-key="hold"]').getAttribute('aria-label')).toMatch(/^Hold radius against minimum altitude/);
    const items = page.locator('#branch-point-list li');
    expect(await items.count()).toBe(2);
    expect(await items.nth(0).innerText()).toMatch(/^ν_z = \+1 \(tangent\)/);
    expect(await items.nth(1).innerText()).toMatch(/^ν_z = −1 \(period-doubling\)/);
    const hrefs = await page.locator('#branch-point-list a').evaluateAll((links) => links.map((a) => (a as HTMLAnchorElement).href));
    expect(hrefs.length).toBe(3); // the member at the first, the two members around the second
    for (const href of hrefs) expect((await context.request.get(href)).status()).toBe(200);
    await page.close();
  });

  it('the finder filters by hold radius and survival as the same SQL query does, and saves those columns', async () => {
    const query = 'hmin=300&sunmin=0.5';
    const page = await open(`finder/?${query}`);
    await page.waitForSelector('#finder[data-ready="true"]');
    const db = new Database(dbPath, { readonly: true });
    try {
      const expectIds = (q: string) => {
        const { sql, params } = finderSql(queryToState(q).filter);
        return (db.prepare(sql).all(...params) as Array<{ id: string }>).map((r) => r.id);
      };
      const expected = expectIds(query);
      expect(expected.length).toBeGreaterThan(0);
      expect(expected.length).toBeLessThan(expectIds('hmin=0').length);
      expect(await page.locator('#finder-count').getAttribute('data-count')).toBe(String(expected.length));
      expect(await page.inputValue('input[name="hmin"]')).toBe('300');
      const csv = (await downloadText(page, () => page.click('#finder-csv'))).trim().split('\r\n').filter((line) => !line.startsWith('#'));
      const header = csv[0].split(',');
      const col = (name: string) => header.indexOf(name);
      expect(col('holdRadiusKm')).toBeGreaterThan(0);
      const stored = db.prepare(`SELECT h.hold_radius_km AS hold, sb.surviving_fraction AS sun, se.surviving_fraction AS ecc FROM orbits o
        LEFT JOIN hold_radii h ON h.orbit_id = o.id LEFT JOIN model_screenings sb ON sb.orbit_id = o.id AND sb.model = 'bicircular'
        LEFT JOIN model_screenings se ON se.orbit_id = o.id AND se.model = 'elliptic' WHERE o.id = ?`);
      const text = (v: number | null) => (v === null ? '' : String(v));
      for (const line of csv.slice(1)) {
        const cells = line.split(',');
        const dbRow = stored.get(cells[col('orbitId')]) as { hold: number | null; sun: number | null; ecc: number | null };
        expect(cells[col('holdRadiusKm')]).toBe(text(dbRow.hold));
        expect(cells[col('sunSurvivingFraction')]).toBe(text(dbRow.sun));
        expect(cells[col('eccentricitySurvivingFraction')]).toBe(text(dbRow.ecc));
      }
      const json = JSON.parse(await downloadText(page, () => page.click('#finder-json')));
      expect(json.orbits.map((o: { orbitId: string }) => o.orbitId)).toEqual(expected);
      expect(json.orbits.every((o: { holdRadiusKm: number }) => o.holdRadiusKm >= 300)).toBe(true);

      // typing an eccentricity bound narrows at once and the URL keeps it (pass times: bench/site-build.ts)
      await page.fill('input[name="eccmin"]', '0.4');
      const typed = expectIds(`${query}&eccmin=0.4`);
      await expect.poll(() => page.locator('#finder-count').getAttribute('data-count')).toBe(String(typed.length));
      expect(new URL(page.url()).searchParams.get('eccmin')).toBe('0.4');
    } finally {
      db.close();
    }
    await page.close();
  });

  it('the page writes byte for byte what export-state writes for the same orbit, span, step, epoch and frame (OEM apart from CREATION_DATE)', async () => {
    const page = await open(orbitPath(arenstorfId));
    // a date-time field keeps what Chrome's value normalisation leaves (".25", no trailing zero)
    const start = '2031-02-11T18:00:30.25';
    await page.fill('input[name="epoch"]', start);
    expect(await page.inputValue('input[name="epoch"]')).toBe(start);
    await page.fill('input[name="periods"]', '1');
    await page.fill('input[name="step"]', '6');
    await page.selectOption('select[name="stepUnit"]', 'h');
    await page.selectOption('select[name="units"]', 'km');
    const withoutCreation = (text: string) => text.replace(/^CREATION_DATE = .*$/m, 'CREATION_DATE = (left out)');
    for (const frame of ['rotating', 'inertial-primary', 'inertial-secondary', 'eme2000']) {
      await page.selectOption('select[name="frame"]', frame);
      const cli = (format: string) => runExportState({ db: dbPath, orbit: arenstorfId, epoch: `${start}Z`, frame, units: 'km', format, periods: '1', step: '6h' });
      const oem = await downloadText(page, () => page.click('button[data-format="oem"]'));
      expect(withoutCreation(oem), frame).toBe(withoutCreation(cli('oem')));
      expect(oem).toMatch(/^CREATION_DATE = \d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{6}$/m);
      if (frame === 'eme2000') {
        expect(await downloadText(page, () => page.click('button[data-format="csv"]'))).toBe(cli('csv'));
        expect(await downloadText(page, () => page.click('button[data-format="json"]'))).toBe(cli('json'));
        const parsed = parseOem(oem);
        expect([parsed.meta.REF_FRAME, parsed.meta.CENTER_NAME, parsed.meta.TIME_SYSTEM]).toEqual(['EME2000', 'EARTH', 'UTC']);
        expect(parsed.epochs.slice(0, 3)).toEqual(['2031-02-11T18:00:30.250000', '2031-02-12T00:00:30.250000', '2031-02-12T06:00:30.250000']);
        expect(await page.locator('[data-role="download-note"]').innerText()).toMatch(new RegExp(`^${parsed.epochs.length} states`));
      }
    }
    await page.close();
  });

  it("the finder's CSV and JSON open with the metadata (systems, μ, LU, TU, frame, run, tolerance)", async () => {
    const page = await open('finder/?sys=earth-moon');
    await page.waitForSelector('#finder[data-ready="true"]');
    const csv = await downloadText(page, () => page.click('#finder-csv'));
    const comments = csv.split('\r\n').filter((line) => line.startsWith('# '));
    expect(csv.startsWith('# cycler-atlas orbit finder: ')).toBe(true);
    expect(comments.some((c) => c.startsWith('# system earth-moon (Earth–Moon): mu = '))).toBe(true);
    expect(comments.some((c) => /^# catalog run \d+: .*rtol = .*atol = /.test(c))).toBe(true);
    const header = csv.split('\r\n').find((line) => !line.startsWith('#'))!.split(',');
    expect(header).toEqual(expect.arrayContaining(['x0', 'vz0', 'xKm', 'vzKmS', 'period', 'periodDays']));
    const json = JSON.parse(await downloadText(page, () => page.click('#finder-json')));
    expect(json.systems.map((s: { id: string }) => s.id)).toEqual(['earth-moon']);
    expect(json.runs.length).toBe(1);
    expect(typeof json.orbits[0].vxKmS).toBe('number');
    await page.close();
  });

  it('one member numbering: title, crumbs, position, neighbours, finder row, family table and chart tooltip agree', async () => {
    const db = new Database(dbPath, { readonly: true });
    const row = db.prepare("SELECT id, seq, family_id FROM orbits WHERE family_id = 'earth-moon/E1M1/a' AND seq = 7").get() as { id: string; seq: number; family_id: string };
    const count = (db.prepare('SELECT count(*) AS n FROM orbits WHERE family_id = ?').get(row.family_id) as { n: number }).n;
    db.close();
    const numbers = (text: string) => [...text.matchAll(/#(\d+)/g)].map((m) => Number(m[1]));
    const page = await open(orbitPath(row.id));
    expect(numbers(await page.locator('h1').innerText())).toEqual([row.seq]);
    expect(numbers(await page.locator('.crumbs').innerText())).toEqual([row.seq]);
    const position = await page.locator('#member-position').innerText();
    expect(numbers(position)[0]).toBe(row.seq);
    expect(position).toContain(`of ${count}`);
    expect(numbers(position).slice(1)).toEqual([0, count - 1]); // the first and last members as their own pages call themselves
    expect(numbers(await page.locator('a[rel="prev"]').innerText())).toEqual([row.seq - 1]);
    expect(numbers(await page.locator('a[rel="next"]').innerText())).toEqual([row.seq + 1]);
    const first = await open(orbitPath(`${row.family_id}/0000`));
    expect(numbers(await first.locator('h1').innerText())).toEqual([0]);
    await first.close();
    await page.close();

    const finder = await open(`finder/?fam=${encodeURIComponent(row.family_id)}`);
    await finder.waitForSelector('#finder[data-ready="true"]');
    expect(numbers(await finder.locator(`#finder-rows tr[data-id="${row.id}"] td`).first().innerText())).toEqual([row.seq]);
    await finder.close();

    const family = await open(familyPath(row.family_id));
    const link = family.locator(`#member-table a[href$="/${idToPath(row.id)}/"]`);
    expect(numbers(await link.innerText())).toEqual([row.seq]);
    await chartsMadeInteractive(family, 'stability');
    const points = family.locator('[data-chart-key="stability"] g.mark-symbol.role-mark path');
    await points.nth(row.seq).hover();
    await family.waitForSelector('#vg-tooltip-element.visible');
    const tooltip = await family.locator('#vg-tooltip-element').innerText();
    const seqInTooltip = Number(/member #\s*(\d+)/.exec(tooltip)?.[1]);
    expect(Number.isInteger(seqInTooltip)).toBe(true);
    // the point's page calls itself by the number its tooltip gave
    await Promise.all([family.waitForURL(/\/orbit\//), points.nth(row.seq).click()]);
    expect(numbers(await family.locator('h1').innerText())).toEqual([seqInTooltip]);
    await family.close();
  });

  it('each family chart says what its colours mean; the vertical one by |ν_z| < 1', async () => {
    const page = await open(familyPath('earth-moon/E1M1/a'));
    const legend = (key: string) => page.locator(`figure:has([data-chart-key="${key}"]) [data-role="chart-legend"]`).innerText();
    expect(await legend('vertical')).toMatch(/vertically stable \(\|ν_z\| < 1\)/);
    expect(await legend('vertical')).not.toMatch(/in-plane/);
    expect(await legend('stability')).toMatch(/in-plane stable \(\|ν\| < 1\)/);
    expect(await page.locator('#family-charts').locator('xpath=preceding::p[1]').innerText()).not.toMatch(/Blue circles: in-plane stable/);
    await page.close();
  });

  it('a family page weighs at most 400 KB on first load and loads the chart runtime only on first interaction', async () => {
    const bytes = new Map<string, number>();
    const page = await context.newPage();
    page.on('response', async (response) => {
      const body = await response.body().catch(() => Buffer.alloc(0));
      bytes.set(response.url(), body.length);
    });
    await page.goto(site.root + familyPath('earth-moon/E1M1/a'), { waitUntil: 'networkidle' });
    const firstLoad = [...bytes.values()].reduce((a, b) => a + b, 0);
    expect(firstLoad, [...bytes].map(([url, n]) => `${n} ${url}`).join('\n')).toBeLessThanOrEqual(400_000);
    expect([...bytes.keys()].some((url) => url.includes('family-charts-client'))).toBe(false);
    expect(await page.locator('#family-charts .chart-host img').count()).toBe(6);
    await chartsMadeInteractive(page, 'stability');
    expect([...bytes.keys()].some((url) => url.includes('family-charts-client'))).toBe(true);
    await page.close();
  });

  it("a family page's zoom buttons redraw the charts over one stable window and back; hidden without JavaScript", async () => {
    const page = await open(familyPath('earth-moon/E1M1/a'));
    const buttons = page.locator('#chart-zoom button[data-zoom]');
    expect(await buttons.count()).toBeGreaterThan(1);
    const label = await buttons.nth(1).innerText(); // "window 1: 400–433 km"
    const [lo, hi] = /: ([\d,]+)–([\d,]+) km/.exec(label)!.slice(1).map((v) => Number(v.replaceAll(',', '')));
    await buttons.nth(1).click();
    const stability = page.locator('[data-chart-key="stability"]');
    await expect.poll(() => stability.getAttribute('data-zoom')).toBe('0');
    // the x-axis labels of the zoomed chart lie around the window (a quarter of its width either side, rounded)
    const xLabels = await stability.evaluate((host) => {
      // the x axis' labels are the row of axis labels lowest in the chart
      const labels = Array.from(host.querySelectorAll('g.role-axis-label text')).map((t) => ({ top: Math.round(t.getBoundingClientRect().top), text: t.textContent ?? '' }));
      const bottom = Math.max(...labels.map((l) => l.top));
      return labels.filter((l) => l.top === bottom).map((l) => l.text);
    });
    const ticks = xLabels.map((t) => Number(t.replaceAll(',', ''))).filter(Number.isFinite);
    expect(ticks.length).toBeGreaterThan(1);
    const margin = Math.max((hi! - lo!) * 0.25, 0.5) + 1;
    for (const t of ticks) expect(t >= lo! - margin && t <= hi! + margin, `${t} in ${label}`).toBe(true);
    expect(await page.locator('[data-chart-key="period"]').getAttribute('data-zoom')).toBe('0');
    await buttons.nth(0).click();
    await expect.poll(() => stability.getAttribute('data-zoom')).toBe('family');
    await page.close();
    const noScript = await browser.newContext({ javaScriptEnabled: false });
    const still = await open(familyPath('earth-moon/E1M1/a'), noScript);
    expect(await still.locator('#chart-zoom').isVisible()).toBe(false);
    await noScript.close();
  });

  it('eigenvalues and the other numbers of an orbit page fit their cells at 1280, 1366 and phone width', async () => {
    // A stable member: its eigenvalues are complex (on the unit circle), the longest numbers on the page.
    const id = screenedOrbit().orbit_id;
    for (const [width, height] of [[1280, 800], [1366, 768], [375, 740]]) {
      const ctx = await browser.newContext({ viewport: { width, height } });
      const page = await open(orbitPath(id), ctx);
      const eigenCount = await page.locator('#orbit-eigenvalues [data-eigenvalue]').count();
      expect(eigenCount, 'four non-unit eigenvalues').toBe(4);
      const overflows = await page.evaluate(() => {
        const bad: string[] = [];
        const viewport = document.documentElement.clientWidth;
        for (const cell of Array.from(document.querySelectorAll('#orbit-numbers dd, #orbit-eigenvalues [data-eigenvalue]'))) {
          const box = cell.getBoundingClientRect();
          const row = (cell.parentElement as HTMLElement).getBoundingClientRect();
          const text = (cell as HTMLElement).innerText;
          if (box.right > row.right + 0.5 || box.left < row.left - 0.5) bad.push(`${text}: outside its row`);
          if (box.right > viewport) bad.push(`${text}: past the page margin`);
          if ((cell as HTMLElement).scrollWidth > (cell as HTMLElement).clientWidth + 1) bad.push(`${text}: wider than its box`);
        }
        return bad;
      });
      expect(overflows, `at ${width} px`).toEqual([]);
      await page.locator('#orbit-eigenvalues').screenshot({ path: join(ARTIFACTS, `orbit-eigenvalues-${width}.png`) });
      await ctx.close();
    }
  });

  it('every page states published sources for the constants; none says "from memory"', () => {
    const pages = builtPages(join(dir, 'dist'));
    expect(pages.length).toBeGreaterThan(20);
    expect(pages.filter((p) => /from memory/i.test(p.html)).map((p) => p.path)).toEqual([]);
    const home = pages.find((p) => p.path === 'index.html')!;
    for (const name of ['JPL DE430 planetary constants (Folkner et al. 2014)', 'WGS-84', 'IAU mean lunar radius']) expect(home.text).toContain(name);
  });

  it('the finder without JavaScript says that filtering needs it, shows no control that would do nothing, and keeps the table', async () => {
    const noScript = await browser.newContext({ javaScriptEnabled: false });
    const finder = await open('finder/', noScript);
    const controls = ['#finder-form', '#finder-csv', '#finder-json', '#finder-prev', '#finder-next', '.sort-button'];
    for (const selector of controls) {
      for (const element of await finder.locator(selector).all()) expect(await element.isVisible(), selector).toBe(false);
    }
    expect(await finder.locator('#finder-status').innerText()).toMatch(/need JavaScript.*41 orbits are listed below/);
    expect(await finder.locator('#finder-rows tr').count()).toBe(41);
    expect(await finder.locator('#finder-table thead th').first().innerText()).not.toBe('');
    await noScript.close();
    const withScript = await open('finder/');
    for (const selector of controls) await expect.poll(() => withScript.locator(selector).first().isVisible(), { message: selector }).toBe(true);
    await expect.poll(() => withScript.locator('#finder-status').innerText()).toBe('');
    expect(await withScript.locator('#finder-table thead [data-no-js]').count()).toBe(0);
    await withScript.close();
  });

  it('the finder names a bad value or a minimum above the maximum, announced, instead of ignoring it silently', async () => {
    const page = await open('finder/?pmin=abc');
    const problems = page.locator('#finder-problems');
    await expect.poll(() => problems.isVisible()).toBe(true);
    expect(await problems.getAttribute('role')).toBe('alert');
    expect(await problems.innerText()).toMatch(/“abc” is not a number, so this bound is ignored/);
    await page.fill('input[name="pmin"]', '30');
    await page.fill('input[name="pmax"]', '20');
    await expect.poll(() => problems.innerText()).toMatch(/minimum 30 is above the maximum 20, so no orbit can match/);
    await page.fill('input[name="pmax"]', '');
    await expect.poll(() => problems.isVisible()).toBe(false);
    await page.close();
  });

  it('small things: a skip link to the content, sizes on the catalog downloads, no timing figure in the finder', async () => {
    const home = await open('');
    await home.keyboard.press('Tab');
    const skip = home.locator('a.skip-link');
    expect(await skip.evaluate((el) => el === document.activeElement)).toBe(true);
    expect(await skip.isVisible()).toBe(true);
    await skip.press('Enter');
    expect(await home.evaluate(() => document.activeElement?.id)).toBe('main');
    const sqliteBytes = statSync(dbPath).size;
    const jsonBytes = statSync(join(dir, 'dist', 'downloads', 'catalog.json')).size;
    // sizes in kB or MB of 1000 (common practice, as the formatter says)
    const kb = (bytes: number) => (bytes / 1e3 < 10 ? (bytes / 1e3).toFixed(1) : String(Math.round(bytes / 1e3)));
    expect(sqliteBytes).toBeLessThan(1e6);
    expect(await home.locator('main a[href$="downloads/catalog.sqlite"]').innerText()).toBe(`SQLite (${kb(sqliteBytes)} kB)`);
    expect(await home.locator('main a[href$="downloads/catalog.json"]').innerText()).toBe(`JSON (${kb(jsonBytes)} kB)`);
    await home.close();
    const finder = await open('finder/');
    await finder.waitForSelector('#finder[data-ready="true"]');
    expect(await finder.locator('main').innerText()).not.toMatch(/filtered in|\d ms\b/);
    await finder.close();
  });

  it("a family page's window table: ranges in ascending order whose ends differ, widths above zero never read 0", async () => {
    const db = new Database(dbPath, { readonly: true });
    const familyId = (db.prepare('SELECT family_id FROM stable_windows ORDER BY family_id LIMIT 1').get() as { family_id: string }).family_id;
    const stored = db.prepare(`SELECT from_secondary_min_alt_km AS a0, to_secondary_min_alt_km AS a1, from_jacobi AS c0, to_jacobi AS c1, width_km AS w
      FROM stable_windows WHERE family_id = ?`).all(familyId) as Array<Record<string, number>>;
    db.close();
    const spread = { alt: stored.filter((w) => w.a0 !== w.a1).length, jacobi: stored.filter((w) => w.c0 !== w.c1).length };
    const shownSpread = { alt: 0, jacobi: 0 };
    const page = await open(familyPath(familyId));
    const read = (cell: string) => cell.split(' – ').map((v) => Number(v.replaceAll(',', '')));
    const rows = page.locator('table tr:has(td[data-window-alt])');
    expect(await rows.count()).toBeGreaterThan(0);
    for (const row of await rows.all()) {
      for (const key of ['alt', 'jacobi'] as const) {
        const [lo, hi] = read(await row.locator(`[data-window-${key}]`).innerText());
        expect(lo, key).toBeLessThanOrEqual(hi!);
        if (lo! < hi!) shownSpread[key]++;
      }
    }
    expect(shownSpread).toEqual(spread); // every window whose ends differ shows ends that differ
    const widths = await page.locator('[data-window-width]').allInnerTexts();
    expect(widths.filter((t) => Number(t.replaceAll(',', '')) > 0).length, widths.join(' | ') + ' vs ' + stored.map((w) => w.w).join(' | ')).toBe(stored.filter((w) => w.w > 0).length);
    await page.close();
  });

  it("the finder's orbit column keeps each id on one line at 1366 px", async () => {
    const ctx = await browser.newContext({ viewport: { width: 1366, height: 768 } });
    const page = await open('finder/', ctx);
    await page.waitForSelector('#finder[data-ready="true"]');
    const lines = await page.locator('#finder-rows td a').evaluateAll((links) => links.map((a) => a.getClientRects().length));
    expect(lines.length).toBeGreaterThan(0);
    expect(lines.filter((n) => n !== 1)).toEqual([]);
    await ctx.close();
  });

  it('pages show plain words for end reasons, segments, kinds and job keys, linked to a glossary that defines them', async () => {
    const pages = builtPages(join(dir, 'dist'));
    const db = new Database(dbPath, { readonly: true });
    const stored = db.prepare('SELECT config_key, seed_segment, end_reason_start, end_reason_end, kind FROM families').all() as Array<Record<string, string>>;
    db.close();
    // The codes of the generator's EndReason type (generator/core/orbits/continue-family.ts), segments and kinds.
    const hyphenated = [...ALL_END_REASONS, 'far-primary', 'far-secondary', 'lyapunov-l1', 'lyapunov-l2'].filter((c) => c.includes('-'));
    const raw = [...new Set([...hyphenated, ...stored.map((f) => f.config_key)])];
    expect(stored.some((f) => f.end_reason_start === 'collision-secondary')).toBe(true); // the catalog does store codes
    const token = (code: string) => new RegExp('(?<![\\w-])' + code.replace(/[.*+?^$|()[\]{}\\/]/g, '\\$&') + '(?![\\w-])');
    const shown = pages.flatMap((p) => raw.filter((code) => token(code).test(p.text)).map((code) => `${p.path}: ${code}`));
    expect(shown).toEqual([]);

    const glossary = await open('glossary/');
    const anchors = [
      ...ALL_END_REASONS.map((c) => `end-reason-${c}`),
      ...['far-primary', 'between', 'far-secondary'].map((c) => `segment-${c}`),
      ...['cycler', 'lyapunov-l1', 'lyapunov-l2', 'retrograde', 'other'].map((c) => `kind-${c}`),
      'mu', 'lu', 'tu', 'km', 'days', 'jacobi', 'nu', 'nu-z', 'lap-signature', 'stable-window', 'member', 'synodic-lock', 'hold-radius', 'job', 'run',
    ];
    for (const anchor of anchors) {
      expect((await glossary.locator(`[id="${anchor}"] dt`).textContent())?.trim(), anchor).toBeTruthy();
      expect(((await glossary.locator(`[id="${anchor}"] dd`).textContent()) ?? '').length, anchor).toBeGreaterThan(20);
    }
    await glossary.close();

    const home = pages.find((p) => p.path === 'index.html')!;
    expect(home.html).toContain(`${BASE}glossary/#end-reason-collision-secondary`);
    expect(home.text).toContain('collision with the smaller body');
    const family = pages.find((p) => p.html.includes(`${BASE}glossary/#kind-lyapunov-l1`))!;
    expect(family, 'a family page links its kind').toBeDefined();
    expect(family.html).toMatch(new RegExp(`${BASE}glossary/#segment-(far-primary|between|far-secondary)`));
    expect(family.html).toContain(`${BASE}glossary/#job`);
  });

  it('no request left 127.0.0.1', () => {
    expect(requests.length).toBeGreaterThan(20);
    const outside = requests.filter((url) => !url.startsWith(site.origin) && !url.startsWith('data:') && !url.startsWith('blob:'));
    expect(outside).toEqual([]);
    expect(pageErrors).toEqual([]);
  });
});

/** A synthetic family member with a hold radius and both screenings. */
function screenedOrbit(): { orbit_id: string; hold_radius_km: number; curve_x: string } {
  const db = new Database(dbPath, { readonly: true });
  try {
    return db.prepare(`SELECT h.orbit_id, h.hold_radius_km, h.curve_x FROM hold_radii h
      WHERE (SELECT count(*) FROM model_screenings m WHERE m.orbit_id = h.orbit_id) = 2 ORDER BY h.orbit_id LIMIT 1`).get() as never;
  } finally {
    db.close();
  }
}

function queryFamilyId(): string {
  return arenstorfId.slice(0, arenstorfId.lastIndexOf('/'));
}
