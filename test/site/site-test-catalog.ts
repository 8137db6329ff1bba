// The small catalog the site tests build from:
// - two SYNTHETIC families (test/fixtures/synthetic-catalog.ts: invented rows, for non-physics checks only),
//   their stable members given SYNTHETIC hold radii and screenings (synthetic-screenings.ts), most of them;
// - one real periodic orbit written as a one-orbit family: the Arenstorf orbit of Hairer, Nørsett & Wanner,
//   Solving ODEs I (2nd ed. 1993), §II.0: μ = 0.012277471, start (0.994, 0), velocity
//   (0, −2.00158510637908252240537862224), period T = 17.0652165601579625588917206249. Its row is analysed
//   by the generator's own analyseOrbit (monodromy, indices, distances), not typed in;
// - a scenario and that family named with HTML and quotes, to check the site shows them as text.
import Database from 'better-sqlite3';
import { lagrangePoints } from '../../generator/core/cr3bp/lagrange-points.ts';
import { findSystemPreset } from '../../generator/core/cr3bp/system-presets.ts';
import { analyseOrbit } from '../../generator/core/orbits/analyse-orbit.ts';
import { orbitRowOf } from '../../generator/core/orbits/build-family-bundle.ts';
import { openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import type { FamilyBundle, SystemRow } from '../../catalog-db/types.ts';
import { writeSyntheticCatalog } from '../fixtures/synthetic-catalog.ts';
import { addSyntheticScreenings } from './synthetic-screenings.ts';

export const ARENSTORF = {
  mu: 0.012277471,
  x0: 0.994,
  vy0: -2.00158510637908252240537862224,
  periodNd: 17.0652165601579625588917206249,
};

/** Text with markup and both kinds of quotes; a page that runs it sets window.__injected. */
export const HOSTILE_TEXT = `<img src=x onerror="window.__injected=1"><script>window.__injected=2</script> "Q" & 'q'`;
export const HOSTILE_SCENARIO = `Test <b>scenario</b> "double" & 'single' <script>window.__injected=3</script>`;
export const ARENSTORF_FAMILY_ID = 'hnw-test/<i>"AR"</i>/a';

// The HNW example's μ is an Earth–Moon ratio; LU and TU are the Earth–Moon ones of DESIGN.md (common practice).
const arenstorfSystem: SystemRow = {
  id: 'hnw-arenstorf',
  name: 'Earth–Moon (HNW μ)',
  mu: ARENSTORF.mu,
  lengthUnitKm: 384_400,
  timeUnitS: 375_190.262,
  primaryName: 'Earth',
  secondaryName: 'Moon',
  primaryLetter: 'E',
  secondaryLetter: 'M',
  primaryRadiusKm: 6378.137,
  secondaryRadiusKm: 1737.4,
  synodicPeriodDays: 29.530589,
  // LU and radii are the Earth–Moon preset's, so the site shows that preset's source text as a real catalog would.
  source: `μ from Hairer, Nørsett & Wanner (1993) §II.0; TU: Earth–Moon value of DESIGN.md (test catalog); LU and radii as the Earth–Moon preset: ${findSystemPreset('earth-moon').source}`,
};

export interface SiteTestCatalog {
  path: string;
  arenstorfOrbitId: string;
}

export function writeSiteTestCatalog(path: string, synthetic = { orbitCount: 40, familyCount: 2 }): SiteTestCatalog {
  writeSyntheticCatalog(path, synthetic);
  addSyntheticScreenings(path);
  const writer = openCatalogForWrite(path);
  let arenstorfOrbitId = '';
  try {
    writer.setScenario({ name: HOSTILE_SCENARIO, description: `Site test catalog. ${HOSTILE_TEXT}`, team: 'Site tests "team" <i>x</i>' });
    writer.upsertSystem(arenstorfSystem);
    const runId = writer.startRun({
      generatorVersion: 'site-test', gitCommit: 'none', configHash: 'none', configPath: 'test/site/site-test-catalog.ts',
      scenarioName: HOSTILE_SCENARIO, scenarioDescription: 'site tests', rtol: 1e-12, atol: 1e-12, shard: '1/1',
      startedAt: '2026-01-02T00:00:00.000Z',
    });
    const xL1 = lagrangePoints(ARENSTORF.mu).find((p) => p.name === 'L1')!.x;
    const analysis = analyseOrbit({ mu: ARENSTORF.mu, xL1, rtol: 1e-12, atol: 1e-12 }, ARENSTORF.x0, ARENSTORF.vy0, ARENSTORF.periodNd);
    const orbit = orbitRowOf(arenstorfSystem, ARENSTORF_FAMILY_ID, 0, {
      x0: ARENSTORF.x0, vy0: ARENSTORF.vy0, xHalf: NaN, vyHalf: NaN, halfCrossings: 1, tHalfNd: ARENSTORF.periodNd / 2, arclength: 0, analysis, tangent: [0, 1],
    });
    const bundle: FamilyBundle = {
      family: {
        id: ARENSTORF_FAMILY_ID, systemId: arenstorfSystem.id, runId, configKey: 'site-test:arenstorf', name: HOSTILE_TEXT,
        kind: 'other', signature: orbit.signature, primaryLaps: 0, secondaryLaps: 0, seedSegment: 'far-secondary',
        endReasonStart: 'single orbit', endReasonEnd: 'single orbit', memberCount: 1, jacobiMin: orbit.jacobi,
        jacobiMax: orbit.jacobi, periodDaysMin: orbit.periodDays, periodDaysMax: orbit.periodDays, stableWindowCount: 0,
      },
      orbits: [orbit],
      stableWindows: [],
      bifurcations: [],
    };
    writer.writeFamily(bundle, { key: 'site-test:arenstorf' });
    arenstorfOrbitId = orbit.id;
    writer.finishRun(runId, '2026-01-02T00:01:00.000Z');
  } finally {
    writer.close();
  }
  giveSyntheticFamiliesCodes(path);
  return { path, arenstorfOrbitId };
}

/**
 * The synthetic families get the generator's own codes for end reasons and kind (they are invented rows
 * anyway), so the site tests see codes a real catalog stores: the pages must show them in plain words.
 */
function giveSyntheticFamiliesCodes(path: string): void {
  const db = new Database(path);
  try {
    const ids = (db.prepare("SELECT id FROM families WHERE system_id = 'earth-moon' ORDER BY id").all() as Array<{ id: string }>).map((r) => r.id);
    const codes = [['collision-secondary', 'member-limit', 'cycler'], ['unstable-far-from-windows', 'jacobi-range', 'lyapunov-l1']];
    const update = db.prepare('UPDATE families SET end_reason_start = ?, end_reason_end = ?, kind = ? WHERE id = ?');
    ids.forEach((id, k) => update.run(...codes[k % codes.length], id));
  } finally {
    db.close();
  }
}

