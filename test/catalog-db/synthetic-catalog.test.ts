// The synthetic benchmark fixture writes the counts asked for, rows the catalog accepts, and an export
// that passes the JSON Schema. (Its numbers are invented; only their bookkeeping is checked here.)
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { exportCatalogJson } from '../../catalog-db/export-catalog.ts';
import { openCatalogForRead } from '../../catalog-db/open-catalog.ts';
import { writeSyntheticCatalog } from '../fixtures/synthetic-catalog.ts';
import { useTempCatalogDir } from './temp-catalog-path.ts';

const catalogPath = useTempCatalogDir();

describe('writeSyntheticCatalog', () => {
  it('writes orbitCount orbits over familyCount families with consistent windows and counts', () => {
    const path = catalogPath('synthetic.sqlite');
    const summary = writeSyntheticCatalog(path, { orbitCount: 503, familyCount: 14 });
    const reader = openCatalogForRead(path);
    const families = reader.families();
    expect(families).toHaveLength(14);
    expect(reader.orbits()).toHaveLength(503);
    expect(summary).toEqual({
      families: 14,
      orbits: 503,
      stableWindows: reader.stableWindows().length,
      bifurcations: reader.bifurcations().length,
    });
    expect(summary.stableWindows).toBeGreaterThan(0);
    expect(summary.bifurcations).toBeGreaterThan(0);
    expect(new Set(families.map((f) => f.memberCount))).toEqual(new Set([35, 36])); // 503 = 13·36 + 35
    for (const orbit of reader.orbits()) expect(orbit.stable).toBe(Math.abs(orbit.stabilityIndex) < 1);
    for (const window of reader.stableWindows()) expect(reader.orbit(window.midOrbitId)?.stable).toBe(true);
    const system = reader.systems()[0]!;
    // Earth–Moon constants as given in /work/shared/DESIGN.md (DE430 GMs, WGS-84, IAU, almanac; from memory)
    expect([system.mu, system.lengthUnitKm, system.timeUnitS, system.primaryRadiusKm, system.secondaryRadiusKm, system.synodicPeriodDays]).toEqual([
      0.0121505842695, 384400, 375190.262, 6378.137, 1737.4, 29.530589,
    ]);
    const schema = z.fromJSONSchema(JSON.parse(readFileSync(new URL('../../catalog-db/catalog-export.schema.json', import.meta.url), 'utf8')));
    expect(schema.safeParse(exportCatalogJson(reader)).success).toBe(true);
    reader.close();
  });

  it('refuses bad counts and an existing file', () => {
    const path = catalogPath('exists.sqlite');
    writeSyntheticCatalog(path, { orbitCount: 3, familyCount: 1 });
    expect(() => writeSyntheticCatalog(path, { orbitCount: 3, familyCount: 1 })).toThrow('already exists');
    expect(() => writeSyntheticCatalog(catalogPath('x.sqlite'), { orbitCount: 2, familyCount: 3 })).toThrow(
      'orbitCount must be an integer >= familyCount (3), got 2',
    );
    expect(() => writeSyntheticCatalog(catalogPath('y.sqlite'), { orbitCount: 5, familyCount: 0 })).toThrow(
      'familyCount must be an integer >= 1, got 0',
    );
  });
});
