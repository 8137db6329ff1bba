// Fresh catalog paths under the OS temp directory, removed after the test file.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll } from 'vitest';

/** Call once at the top of a test file; returns a function giving a new path per name. */
export function useTempCatalogDir(): (name: string) => string {
  const dir = mkdtempSync(join(tmpdir(), 'cycler-atlas-catalog-test-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  return (name) => join(dir, name);
}
