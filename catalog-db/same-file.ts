// Whether two paths name one file once symlinks, "..", and relative parts are resolved. A path that
// does not exist yet resolves through its directory, so a new output can still be compared.
import { realpathSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';

export function realPathOf(path: string): string {
  try {
    return realpathSync.native(path);
  } catch {
    const parent = dirname(resolve(path));
    return parent === resolve(path) ? resolve(path) : join(realPathOf(parent), basename(path));
  }
}

/** SQLite keeps a catalog's recent writes beside it: writing over these damages the catalog too. */
export const SQLITE_SIDE_FILE_SUFFIXES = ['', '-wal', '-shm', '-journal'] as const;

/** True when `path` is the catalog `catalogPath` or one of its SQLite side files. */
export function isCatalogOrSideFile(path: string, catalogPath: string): boolean {
  const target = realPathOf(path);
  const catalog = realPathOf(catalogPath);
  return SQLITE_SIDE_FILE_SUFFIXES.some((suffix) => target === `${catalog}${suffix}`);
}
