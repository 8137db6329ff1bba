// Every HTML page of a built site, with its path under the output folder and its text as a reader sees it
// (tags, scripts and styles removed, entities decoded), for checks that run over all pages at once.
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';

export interface BuiltPage {
  path: string;
  html: string;
  text: string;
}

const ENTITIES: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', '#39': "'", nbsp: ' ' };

export function visibleText(html: string): string {
  return html
    .replace(/<script\b[\s\S]*?<\/script>/gi, ' ')
    .replace(/<style\b[\s\S]*?<\/style>/gi, ' ')
    .replace(/<[^>]*>/g, ' ')
    .replace(/&(amp|lt|gt|quot|#39|nbsp);/g, (_, name: string) => ENTITIES[name])
    .replace(/&#(\d+);/g, (_, code: string) => String.fromCodePoint(Number(code)))
    .replace(/\s+/g, ' ');
}

export function builtPages(outDir: string): BuiltPage[] {
  const pages: BuiltPage[] = [];
  const walk = (dir: string): void => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const full = join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (entry.name.endsWith('.html')) {
        const html = readFileSync(full, 'utf8');
        pages.push({ path: relative(outDir, full), html, text: visibleText(html) });
      }
    }
  };
  walk(outDir);
  return pages;
}
