// A site built from a catalog with one long SYNTHETIC family (test/fixtures/synthetic-catalog.ts: invented
// rows, not physics): exactly the paged members (site/lib/paged-members.ts) get an orbit page and a finder
// row, every link to an orbit page, in pages and in the family's chart images, resolves, and the family page
// says how many members it lists of how many.
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readCatalogSnapshot } from '../../site/lib/catalog-source.ts';
import { idToPath } from '../../site/lib/id-path.ts';
import { writeSyntheticCatalog } from '../fixtures/synthetic-catalog.ts';
import { buildSite } from './build-site.ts';
import { builtPages, type BuiltPage } from './built-pages.ts';

const MEMBERS = 300;
let dir = '';
let outDir = '';
let pages: BuiltPage[] = [];
let pagedIds: string[] = [];

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'paged-site-'));
  const dbPath = join(dir, 'long.sqlite');
  writeSyntheticCatalog(dbPath, { orbitCount: MEMBERS, familyCount: 1 });
  pagedIds = readCatalogSnapshot(dbPath).pagedOrbits.map((o) => o.id);
  outDir = join(dir, 'site');
  await buildSite({ dbPath, outDir });
  pages = builtPages(outDir);
}, 180_000);

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('a long family on the site', () => {
  it('pages only the paged members, and the finder lists exactly them', () => {
    expect(pagedIds.length).toBeGreaterThan(20);
    expect(pagedIds.length).toBeLessThan(MEMBERS / 2);
    const orbitPages = pages.filter((p) => p.path.startsWith('orbit/')).map((p) => p.path).sort();
    expect(orbitPages).toEqual(pagedIds.map((id) => `orbit/${idToPath(id)}/index.html`).sort());
    const finder = JSON.parse(readFileSync(join(outDir, 'data/finder.json'), 'utf8')) as { count: number };
    expect(finder.count).toBe(pagedIds.length);
  });

  it('links only to orbit pages that exist, from pages and chart images', () => {
    const svgs = ['stability', 'jacobi', 'period', 'vertical'].map((key) => join(outDir, 'chart-images', idToPath('earth-moon/E1M1/a'), `${key}.svg`))
      .filter(existsSync).map((file) => readFileSync(file, 'utf8'));
    const texts = [...pages.map((p) => p.html), ...svgs];
    let links = 0;
    for (const text of texts) {
      for (const match of text.matchAll(/href="\/(orbit\/[^"#?]+)"/g)) {
        links++;
        expect(existsSync(join(outDir, match[1], 'index.html')), match[1]).toBe(true);
      }
    }
    expect(links).toBeGreaterThan(pagedIds.length);
    expect(svgs.length).toBe(4);
    for (const svg of svgs) expect(svg).not.toMatch(/href="(null|undefined)?"/);
  });

  it('says on the family page how many members it lists', () => {
    const family = pages.find((p) => p.path === `family/${idToPath('earth-moon/E1M1/a')}/index.html`)!;
    expect(family.text).toContain(`${pagedIds.length} of the family's ${MEMBERS} members have a page of their own`);
    expect(family.html.match(/<tr>\s*<td class="r num"><a href="\/orbit\//g)?.length).toBe(pagedIds.length);
  });
});
