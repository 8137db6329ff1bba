// Site build benchmark: total build time and time per page (Astro's own per-route timings) for the
// catalog at CYCLER_ATLAS_DB (if the file exists) and for a SYNTHETIC catalog of 10,000 orbits; the orbit
// page's weight (its HTML and the files only it uses, apart from shared cached ones); the finder's data
// asset; and one finder filter pass in chromium on the 10,000-orbit site.
// Targets: under 20 ms per orbit page; an orbit page under 150 KB; a filter pass under 16 ms.
// Run: `npx tsx bench/site-build.ts [--db path] [--orbits 10000] [--families 20] [--no-browser]`.
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { gzipSync } from 'node:zlib';
import { buildSite } from '../test/site/build-site.ts';
import { writeSyntheticCatalog } from '../test/fixtures/synthetic-catalog.ts';

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
  };
}

async function finderFilterInBrowser(outDir: string): Promise<number[] | null> {
  if (!existsSync('/usr/bin/chromium')) return null;
  const { chromium } = await import('playwright-core');
  const { serveStatic } = await import('../test/site/static-server.ts');
  const site = await serveStatic(outDir, '/');
  const browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: ['--no-sandbox', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
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
    return times;
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
    console.log(`family pages (${family.n}): mean ${family.mean.toFixed(0)} ms, median ${family.median.toFixed(0)} ms (4 charts rendered by vega each)`);
    console.log(`orbit page weight: HTML mean ${kb(weight.meanHtml)}, largest ${kb(weight.largestHtml)} (${kb(weight.largestHtmlGzip)} gzip)   [target < 150 KB]`);
    console.log(`  + family stability chart SVG ${kb(weight.familyChart)} (one file per family, cached across its members)`);
    console.log(`  shared cached CSS/JS referenced: ${kb(weight.shared)}`);
    console.log(`finder data asset: ${kb(finderJson.length)} (${kb(gzipSync(finderJson).length)} gzip) for the whole catalog`);
    if (browser) {
      const filter = await finderFilterInBrowser(outDir);
      if (filter) console.log(`finder filter pass in chromium: ${filter.map((t) => t.toFixed(2)).join(', ')} ms (max ${Math.max(...filter).toFixed(2)})   [target < 16 ms]`);
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
  if (existsSync(given)) await benchCatalog('given catalog', given, false);
  else console.log(`(no catalog at ${given}; pass --db or set CYCLER_ATLAS_DB to time a real one)`);

  const dir = mkdtempSync(join(tmpdir(), 'site-bench-db-'));
  try {
    const dbPath = join(dir, 'synthetic.sqlite');
    writeSyntheticCatalog(dbPath, { orbitCount, familyCount });
    await benchCatalog(`SYNTHETIC catalog, ${orbitCount} orbits in ${familyCount} families (invented rows, not physics)`, dbPath, browser);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
