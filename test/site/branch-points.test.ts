// The family page's "branch points of spatial families": exactly the bifurcation rows with plane 'vertical'
// (ν_z = +1 tangent, −1 period doubling), each linked to the member stored at it, or else to the members on
// either side along the family; checked against the catalog's own SQL (the vertical_branch_points view and
// a neighbour query), not against the site's code.
import Database from 'better-sqlite3';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { branchPoints } from '../../site/lib/branch-points.ts';
import { readCatalogSnapshot, type CatalogSnapshot } from '../../site/lib/catalog-source.ts';
import { orbitHref } from '../../site/lib/page-links.ts';
import { writeSiteTestCatalog } from './site-test-catalog.ts';

let dir: string;
let db: Database.Database;
let catalog: CatalogSnapshot;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'branch-points-test-'));
  const path = join(dir, 'catalog.sqlite');
  writeSiteTestCatalog(path, { orbitCount: 60, familyCount: 3 });
  catalog = readCatalogSnapshot(path);
  db = new Database(path, { readonly: true });
});
afterAll(() => {
  db?.close();
  rmSync(dir, { recursive: true, force: true });
});

describe('branch points of spatial families', () => {
  it('list every vertical bifurcation with ν_z = ±1 and the member(s) the SQL finds at or around it', () => {
    const view = db.prepare('SELECT * FROM vertical_branch_points WHERE family_id = ? ORDER BY bifurcation_id');
    const below = db.prepare('SELECT id FROM orbits WHERE family_id = ? AND arclength <= ? ORDER BY arclength DESC LIMIT 1').pluck();
    const above = db.prepare('SELECT id FROM orbits WHERE family_id = ? AND arclength >= ? ORDER BY arclength LIMIT 1').pluck();
    let total = 0;
    let atMember = 0;
    for (const family of catalog.families) {
      const rows = view.all(family.id) as Array<{ bifurcation_id: string; orbit_id: string | null; vertical_index: number }>;
      const points = branchPoints(catalog.bifurcationsByFamily.get(family.id) ?? [], catalog.orbitsByFamily.get(family.id) ?? []);
      expect(points.map((p) => p.bifurcation.id).sort()).toEqual(rows.map((r) => r.bifurcation_id));
      for (const row of rows) {
        const point = points.find((p) => p.bifurcation.id === row.bifurcation_id)!;
        expect(point.verticalIndex).toBe(row.vertical_index);
        if (row.orbit_id !== null) {
          atMember++;
          expect(point.member?.href).toBe(orbitHref(row.orbit_id));
        } else {
          expect(point.member).toBeNull();
          const s = point.bifurcation.arclength;
          expect(point.before?.id ?? null).toBe(below.get(family.id, s) ?? null);
          expect(point.after?.id ?? null).toBe(above.get(family.id, s) ?? null);
        }
        total++;
      }
    }
    // SYNTHETIC rows: one at a member and one between members in each synthetic family
    expect(total).toBe(6);
    expect(atMember).toBe(3);
  });
});
