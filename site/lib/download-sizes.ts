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

export function catalogDownloadSizes(): { sqlite: string; json: string } {
  return {
    sqlite: formatBytes(statSync(catalogDbPath()).size),
    json: formatBytes(Buffer.byteLength(catalogJsonText(), 'utf8')),
  };
}
