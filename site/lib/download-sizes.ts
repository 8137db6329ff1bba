// The sizes of the whole-catalog downloads, as the links beside them state them ("SQLite, 1.2 MB").
import { statSync } from 'node:fs';
import { catalogJsonText } from './catalog-json-text.ts';
import { catalogDbPath } from './catalog-source.ts';

/** Bytes in words: B below 1 kB, then kB and MB (powers of 1000) with 2 significant digits at least. */
export function formatBytes(bytes: number): string {
  if (bytes < 1000) return `${bytes} B`;
  const [value, unit] = bytes < 1e6 ? [bytes / 1e3, 'kB'] : [bytes / 1e6, 'MB'];
  return `${value < 10 ? value.toFixed(1) : Math.round(value)} ${unit}`;
}

const sizesByDb = new Map<string, { sqlite: string; json: string }>();

/**
 * Measured once per build and catalog: every page's footer states them, and measuring the JSON text (a
 * UTF-8 scan of the whole catalog, some 200 MB for the complete atlas) on each page made every page of a
 * large catalog take about a tenth of a second.
 */
export function catalogDownloadSizes(): { sqlite: string; json: string } {
  const dbPath = catalogDbPath();
  let sizes = sizesByDb.get(dbPath);
  if (!sizes) {
    sizes = { sqlite: formatBytes(statSync(dbPath).size), json: formatBytes(Buffer.byteLength(catalogJsonText(), 'utf8')) };
    sizesByDb.set(dbPath, sizes);
  }
  return sizes;
}
