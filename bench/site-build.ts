// Site build benchmark: total build time and time per page (Astro's own per-route timings) for the
// catalog at CYCLER_ATLAS_DB (if the file exists) and for a SYNTHETIC catalog of 10,000 orbits whose stable
// members carry SYNTHETIC hold radii (400 curve points, the generator's maximum) and screenings; the orbit
// page's weight (its HTML and the files only it uses, apart from shared cached ones), screened pages apart;
// the finder's data asset; finder filter passes in chromium on the 10,000-orbit site (the hold-radius and
// survival bounds included); and the time of an epoch-dated (EME2000) download in chromium.
// Targets: under 20 ms per orbit page; an orbit page under 150 KB; a filter pass under 16 ms.
// Run: `npx tsx bench/site-build.ts [--db path] [--orbits 10000] [--families 20] [--no-browser]`.
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { gzipSync } from 'node:zlib';
import { buildSite } from '../test/site/build-site.ts';
import { writeSyntheticCatalog } from '../test/fixtures/synthetic-catalog.ts';
import { addSyntheticScreenings } from '../test/site/synthetic-screenings.ts';
import { CHROMIUM_PATH, launchChromium } from '../test/site/launch-chromium.ts';

interface RouteTime {
  route: string;
  ms: number;
}

/** Astro prints each generated route as "├─ /path (+12ms)" or "(+1.20s)". */
function routeTimes(log: string): RouteTime[] {
  const times: RouteTime[] = [];
  for (const match of log.matchAll(/[├└]─ (\S+) \(\+([\d.]+)(ms|s)\)/g)) {
    times.push({ route: match[1], ms: Number(match[2]) * (match[3] === 's' ? 1000 : 1) });
  }
  return times;
}

function phaseSeconds(log: string, label: string): number | null {
  const match = new RegExp(`${label}[\\s\\S]*?✓ (?:built|Completed) in ([\\d.]+)(ms|s)`).exec(log);
  return match ? Number(match[1]) / (match[2] === 'ms' ? 1000 : 1) : null;
}

function stats(values: number[]) {
  const sorted = [...values].sort((a, b) => a - b);
  const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))] ?? NaN;
  const mean = values.reduce((a, b) => a + b, 0) / Math.max(1, values.length);
  return { n: values.length, mean, median: at(0.5), p95: at(0.95), max: sorted[sorted.length - 1] ?? NaN };
}

const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} KB`;

function filesUnder(dir: string): string[] {
  return readdirSync(dir, { recursive: true, withFileTypes: true })
    .filter((d) => d.isFile())
    .map((d) => join(d.parentPath ?? (d as unknown as { path: string }).path, d.name));
}

/** Weight of one orbit page: its HTML, the family chart file it shows (shared by the family), shared CSS/JS. */
function orbitPageWeight(outDir: string, base: string) {
  const orbitDir = join(outDir, 'orbit');
  const pages = filesUnder(orbitDir).filter((f) => f.endsWith('index.html'));
  const sizes = pages.map((f) => statSync(f).size);
  const largest = pages[sizes.indexOf(Math.max(...sizes))];
  const screenedSizes = pages.map((f, i) => [f, sizes[i]] as const)
    .filter(([f]) => readFileSync(f, 'utf8').includes('data-screened="true"')).map(([, size]) => size);
  const html = readFileSync(largest, 'utf8');
  const refs = [...html.matchAll(/(?:src|href)="([^"]+)"/g)].map((m) => m[1]).filter((u) => u.startsWith(base));
  let familyChart = 0;
  let shared = 0;
  for (const ref of new Set(refs)) {
    const file = join(outDir, ref.slice(base.length));
    if (!existsSync(file) || statSync(file).isDirectory()) continue;
    if (ref.includes('/chart-images/')) familyChart += statSync(file).size;
    else if (ref.includes('/_astro/')) shared += statSync(file).size;
  }
  return {
    pages: pages.length,
    meanHtml: sizes.reduce((a, b) => a + b, 0) / sizes.length,
    largestHtml: Math.max(...sizes),
    largestHtmlGzip: gzipSync(html).length,
    familyChart,
    shared,
    largestPage: largest.slice(outDir.length),
    screenedPages: screenedSizes.length,
    meanScreenedHtml: screenedSizes.reduce((a, b) => a + b, 0) / Math.max(1, screenedSizes.length),
  };
}

/** First-load weight of the largest family page: its HTML and the chart images, CSS and scripts it references
 *  (the chart runtime and specs, loaded on first interaction, apart). */
function familyPageWeight(outDir: string, base: string) {
  const pages = filesUnder(join(outDir, 'family')).filter((f) => f.endsWith('index.html'));
  const sizes = pages.map((f) => statSync(f).size);
  const largest = pages[sizes.indexOf(Math.max(...sizes))];
  const html = readFileSync(largest, 'utf8');
  let referenced = 0;
  // what the browser fetches on load: src attributes and <link> hrefs (stylesheets, preloads), not links
  const loaded = [...html.matchAll(/\ssrc="([^"]+)"|<link\b[^>]*\shref="([^"]+)"/g)].map((m) => m[1] ?? m[2]!);
  for (const ref of new Set(loaded.filter((u) => u.startsWith(base)))) {
    const file = join(outDir, ref.slice(base.length));
    if (existsSync(file) && !statSync(file).isDirectory() && !ref.endsWith('/')) referenced += statSync(file).size;
  }
  const runtime = filesUnder(join(outDir, '_astro')).filter((f) => f.includes('family-charts-client')).reduce((a, f) => a + statSync(f).size, 0);
  return { page: largest.slice(outDir.length), html: html.length, referenced, runtime, meanHtml: sizes.reduce((a, b) => a + b, 0) / sizes.length };
}

async function finderFilterInBrowser(outDir: string): Promise<number[] | null> {
  if (!existsSync(CHROMIUM_PATH)) return null;
  const { serveStatic } = await import('../test/site/static-server.ts');
  const site = await serveStatic(outDir, '/');
  const browser = await launchChromium();
  try {
    const page = await browser.newPage();
    await page.goto(`${site.root}finder/`);
    await page.waitForSelector('#finder[data-ready="true"]');
    const times: number[] = [];
    // typing a Jacobi bound digit by digit: one filter pass per keystroke
    for (const value of ['3', '3.', '3.0', '3.05', '3.08', '3.1', '']) {
      await page.fill('input[name="cmin"]', value);
      times.push(Number(await page.locator('#finder-time').getAttribute('data-ms')));
    }
    await page.check('input[name="stable"]');
    times.push(Number(await page.locator('#finder-time').getAttribute('data-ms')));
    // the screening bounds: a hold radius typed digit by digit, then both survival bounds
    for (const value of ['1', '10', '100', '300']) {
      await page.fill('input[name="hmin"]', value);
      times.push(Number(await page.locator('#finder-time').getAttribute('data-ms')));
    }
    await page.fill('input[name="sunmin"]', '0.5');
    times.push(Number(await page.locator('#finder-time').getAttribute('data-ms')));
    await page.fill('input[name="eccmin"]', '0.5');
    times.push(Number(await page.locator('#finder-time').getAttribute('data-ms')));
    return times;
  } finally {
    await browser.close();
    await site.close();
  }
}

/** Browser time of epoch-dated (EME2000) downloads on one orbit page: the page's own "computed in" note. */
async function datedDownloadInBrowser(outDir: string, orbitPath: string): Promise<string[] | null> {
  if (!existsSync(CHROMIUM_PATH)) return null;
  const { serveStatic } = await import('../test/site/static-server.ts');
  const site = await serveStatic(outDir, '/');
  const browser = await launchChromium();
  try {
    const context = await browser.newContext({ acceptDownloads: true });
    const page = await context.newPage();
    await page.goto(`${site.root}${orbitPath}`);
    await page.selectOption('select[name="frame"]', 'eme2000');
    const notes: string[] = [];
    for (const [periods, step, unit] of [['1', '1', 'h'], ['10', '10', 'min']]) {
      await page.fill('input[name="periods"]', periods);
      await page.fill('input[name="step"]', step);
      await page.selectOption('select[name="stepUnit"]', unit);
      await Promise.all([page.waitForEvent('download'), page.click('button[data-format="oem"]')]);
      notes.push(`${periods} period(s) at ${step} ${unit}: ${await page.locator('[data-role="download-note"]').innerText()}`);
    }
    return notes;
  } finally {
    await browser.close();
    await site.close();
  }
}

async function benchCatalog(label: string, dbPath: string, browser: boolean): Promise<void> {
  const outDir = mkdtempSync(join(tmpdir(), 'site-bench-'));
  try {
    const build = await buildSite({ dbPath, outDir, base: '/' });
    const routes = routeTimes(build.log);
    const orbit = stats(routes.filter((r) => r.route.startsWith('/orbit/')).map((r) => r.ms));
    const family = stats(routes.filter((r) => r.route.startsWith('/family/')).map((r) => r.ms));
    const htmlPages = filesUnder(outDir).filter((f) => f.endsWith('.html')).length;
    const weight = orbitPageWeight(outDir, '/');
    const finderJson = readFileSync(join(outDir, 'data', 'finder.json'));
    console.log(`\n### ${label}`);
    console.log(`catalog: ${dbPath}`);
    console.log(`total build: ${(build.ms / 1000).toFixed(1)} s for ${htmlPages} HTML pages (${(build.ms / htmlPages).toFixed(1)} ms per page overall, bundling included)`);
    const ssr = phaseSeconds(build.log, 'Building static entrypoints');
    const client = phaseSeconds(build.log, 'building client');
    const pages = phaseSeconds(build.log, 'generating static routes');
    console.log(`phases: server bundle ${ssr ?? '?'} s, client bundle ${client ?? '?'} s, page generation ${pages ?? '?'} s`);
    console.log(`orbit pages (${orbit.n}): mean ${orbit.mean.toFixed(1)} ms, median ${orbit.median.toFixed(1)} ms, p95 ${orbit.p95.toFixed(1)} ms, max ${orbit.max.toFixed(0)} ms   [target < 20 ms]`);
    const screenedRoute = (route: string) => {
      const file = join(outDir, route.endsWith('.html') ? route : `${route}/index.html`);
      return existsSync(file) && readFileSync(file, 'utf8').includes('data-screened="true"');
    };
    const orbitRoutes = routes.filter((r) => r.route.startsWith('/orbit/'));
    const screened = stats(orbitRoutes.filter((r) => screenedRoute(r.route)).map((r) => r.ms));
    const plain = stats(orbitRoutes.filter((r) => !screenedRoute(r.route)).map((r) => r.ms));
    console.log(`  screened orbit pages (${screened.n}): mean ${screened.mean.toFixed(1)} ms, median ${screened.median.toFixed(1)} ms; others (${plain.n}): mean ${plain.mean.toFixed(1)} ms, median ${plain.median.toFixed(1)} ms`);
    console.log(`family pages (${family.n}): mean ${family.mean.toFixed(0)} ms, median ${family.median.toFixed(0)} ms (4 to 6 charts rendered by vega each: a window close-up where there are windows, hold radius where members were screened)`);
    const familyWeight = familyPageWeight(outDir, '/');
    console.log(`family page first load (largest, ${familyWeight.page}): HTML ${kb(familyWeight.html)} + chart images, CSS, scripts ${kb(familyWeight.referenced)} = ${kb(familyWeight.html + familyWeight.referenced)}   [target ≤ 400 KB]; HTML mean ${kb(familyWeight.meanHtml)}`);
    console.log(`  chart runtime on first interaction: ${kb(familyWeight.runtime)} (shared, cached)`);
    console.log(`orbit page weight: HTML mean ${kb(weight.meanHtml)}, largest ${kb(weight.largestHtml)} (${kb(weight.largestHtmlGzip)} gzip)   [target < 150 KB]`);
    console.log(`  screened members' pages (hold radius, section plot, screenings): ${weight.screenedPages}, HTML mean ${kb(weight.meanScreenedHtml)}`);
    console.log(`  + family stability chart SVG ${kb(weight.familyChart)} (one file per family, cached across its members)`);
    console.log(`  shared cached CSS/JS referenced: ${kb(weight.shared)}`);
    console.log(`finder data asset: ${kb(finderJson.length)} (${kb(gzipSync(finderJson).length)} gzip) for the whole catalog`);
    if (browser) {
      const filter = await finderFilterInBrowser(outDir);
      if (filter) console.log(`finder filter pass in chromium: ${filter.map((t) => t.toFixed(2)).join(', ')} ms (max ${Math.max(...filter).toFixed(2)})   [target < 16 ms]`);
      const firstOrbit = filesUnder(join(outDir, 'orbit')).find((f) => f.endsWith('index.html'));
      const dated = firstOrbit ? await datedDownloadInBrowser(outDir, firstOrbit.slice(outDir.length + 1).replace(/index\.html$/, '')) : null;
      if (dated) for (const note of dated) console.log(`epoch-dated OEM in chromium, ${note}`);
    }
  } finally {
    rmSync(outDir, { recursive: true, force: true });
  }
}

function arg(name: string): string | undefined {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 ? process.argv[i + 1] : undefined;
}

export async function run(): Promise<void> {
  const orbitCount = Number(arg('orbits') ?? 10_000);
  const familyCount = Number(arg('families') ?? 20);
  const browser = !process.argv.includes('--no-browser');
  const given = resolve(arg('db') ?? process.env.CYCLER_ATLAS_DB ?? 'catalog-db/demo.sqlite');
  if (existsSync(given)) {
    // an old catalog file (earlier schema version) is reported, not fatal: the synthetic run still goes
    await benchCatalog('given catalog', given, false).catch((error) => console.log(`(given catalog ${given} not built: ${(error as Error).message.split('\n')[0]})`));
  }
  else console.log(`(no catalog at ${given}; pass --db or set CYCLER_ATLAS_DB to time a real one)`);

  const dir = mkdtempSync(join(tmpdir(), 'site-bench-db-'));
  try {
    const dbPath = join(dir, 'synthetic.sqlite');
    writeSyntheticCatalog(dbPath, { orbitCount, familyCount });
    // worst case for page weight: every screened member with a hold radius of 400 curve points
    const screened = addSyntheticScreenings(dbPath, { curvePoints: 400, holdEvery: 1 });
    await benchCatalog(
      `SYNTHETIC catalog, ${orbitCount} orbits in ${familyCount} families, ${screened.holdRadii} with synthetic hold radii (invented rows, not physics)`,
      dbPath, browser,
    );
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
