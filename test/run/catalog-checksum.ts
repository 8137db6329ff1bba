// A checksum of everything a catalog holds (every row of every table, in key order), so that a test
// can require that a refused command left the catalog exactly as it was.
import { createHash } from 'node:crypto';
import { existsSync } from 'node:fs';
import Database from 'better-sqlite3';

export function catalogChecksum(path: string): string {
  if (!existsSync(path)) return 'absent';
  const db = new Database(path, { readonly: true, fileMustExist: true });
  try {
    const hash = createHash('sha256');
    hash.update(`user_version ${db.pragma('user_version', { simple: true })}\n`);
    const tables = db.prepare("SELECT name FROM sqlite_schema WHERE type = 'table' ORDER BY name").pluck().all() as string[];
    for (const table of tables) {
      hash.update(`table ${table}\n`);
      for (const row of db.prepare(`SELECT * FROM "${table}" ORDER BY 1, 2`).raw().all()) hash.update(`${JSON.stringify(row)}\n`);
    }
    return hash.digest('hex');
  } finally {
    db.close();
  }
}
