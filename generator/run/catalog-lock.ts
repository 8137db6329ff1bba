// One generate (or merge) at a time per catalog. The lock is SQLite's own: an exclusive transaction
// held on a small side file `<catalog>.lock` for as long as the run lasts. The operating system drops
// it when the process ends in any way (Ctrl-C, kill -9, a crash), so a lock is never left stale. The
// side file holds no data and is kept (removing it could let two runs lock two different files).
import Database from 'better-sqlite3';
import { realPathOf } from '../../catalog-db/same-file.ts';
import { UsageError } from '../errors/usage-error.ts';

export type ReleaseLock = () => void;

const RETRY_MS = 1000;

/** Beside the real file, so that two spellings of one catalog (relative, absolute, a symlink) share it. */
export function lockPathOf(dbPath: string): string {
  return `${realPathOf(dbPath)}.lock`;
}

/** Takes the lock now, or returns null when another process holds it. */
export function tryLockCatalog(dbPath: string): ReleaseLock | null {
  const db = new Database(lockPathOf(dbPath), { timeout: 0 });
  try {
    db.exec('BEGIN EXCLUSIVE');
  } catch (error) {
    db.close();
    if ((error as { code?: string }).code === 'SQLITE_BUSY') return null;
    throw error;
  }
  return () => {
    db.exec('ROLLBACK');
    db.close();
  };
}

/** Takes the lock now or refuses (exit 2) naming the option; waitOption, when given, is offered. */
export function lockCatalogNow(option: string, dbPath: string, waitOption?: string): ReleaseLock {
  const release = tryLockCatalog(dbPath);
  if (release !== null) return release;
  const orWait = waitOption === undefined ? '' : `, or add ${waitOption} to wait for it`;
  throw new UsageError(`${option}: "${dbPath}" is held by another run (lock ${lockPathOf(dbPath)}); let it finish${orWait}`);
}

/** Takes the lock; when another run holds it, refuses (exit 2) or, with wait, retries every second. */
export async function lockCatalog(
  option: string,
  dbPath: string,
  options: { wait: boolean; waitOption: string; log: (line: string) => void },
): Promise<ReleaseLock> {
  if (!options.wait) return lockCatalogNow(option, dbPath, options.waitOption);
  let release = tryLockCatalog(dbPath);
  if (release !== null) return release;
  options.log(`waiting: another run holds ${dbPath}`);
  while (release === null) {
    await new Promise((resolve) => setTimeout(resolve, RETRY_MS));
    release = tryLockCatalog(dbPath);
  }
  return release;
}
