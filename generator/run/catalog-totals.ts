// What a catalog holds after a run, read back from the file: the summary line states what is there,
// not what the run meant to write (a write that failed half-way, e.g. on a full disk, is not counted).
import { openCatalogForRead } from '../../catalog-db/open-catalog.ts';

export interface CatalogTotals {
  runFamilies: number; // families whose latest version was written by the run
  runMembers: number;
  families: number;
  members: number;
}

export function catalogTotals(dbPath: string, runId: number): CatalogTotals {
  const reader = openCatalogForRead(dbPath);
  try {
    const totals: CatalogTotals = { runFamilies: 0, runMembers: 0, families: 0, members: 0 };
    for (const family of reader.families()) {
      totals.families += 1;
      totals.members += family.memberCount;
      if (family.runId !== runId) continue;
      totals.runFamilies += 1;
      totals.runMembers += family.memberCount;
    }
    return totals;
  } finally {
    reader.close();
  }
}
