// The site's one door to the database: opens the catalog read-only through catalog-db/ once per build,
// reads every table into memory with lookups by id, and closes the file.
import { resolve } from 'node:path';
import { openCatalogForRead } from '../../catalog-db/open-catalog.ts';
import { pagedMembers } from './paged-members.ts';
import type {
  BifurcationRow, FamilyRow, HoldRadiusRow, ModelScreeningRow, OrbitRow, OrbitScreenings, RunRow, ScenarioMeta,
  SignatureChangeRow, StableWindowRow, SystemRow,
} from '../../catalog-db/types.ts';

export interface CatalogSnapshot {
  dbPath: string;
  scenario: ScenarioMeta | null;
  systems: SystemRow[];
  runs: RunRow[];
  families: FamilyRow[];
  orbits: OrbitRow[];
  stableWindows: StableWindowRow[];
  bifurcations: BifurcationRow[];
  holdRadii: HoldRadiusRow[];
  modelScreenings: ModelScreeningRow[];
  systemById: Map<string, SystemRow>;
  familyById: Map<string, FamilyRow>;
  orbitById: Map<string, OrbitRow>;
  /** Members of each family in seq order. */
  orbitsByFamily: Map<string, OrbitRow[]>;
  /** The orbits that get a page of their own (paged-members.ts), in family and seq order; the rest are in the charts and downloads. */
  pagedOrbits: OrbitRow[];
  pagedOrbitsByFamily: Map<string, OrbitRow[]>;
  pagedOrbitIds: Set<string>;
  windowsByFamily: Map<string, StableWindowRow[]>;
  bifurcationsByFamily: Map<string, BifurcationRow[]>;
  holdRadiiByFamily: Map<string, HoldRadiusRow[]>;
  /** Ends where the family's lap signature changes, with the family each continues into. */
  signatureChangesByFamily: Map<string, SignatureChangeRow[]>;
  /** Hold radius and model screenings of each screened orbit (absent: not screened). */
  screeningsByOrbit: Map<string, OrbitScreenings>;
}

/** Path of the catalog the site is built from: env CYCLER_ATLAS_DB, default catalog-db/demo.sqlite. */
export function catalogDbPath(): string {
  return resolve(process.env.CYCLER_ATLAS_DB || 'catalog-db/demo.sqlite');
}

function groupBy<T>(rows: T[], key: (row: T) => string): Map<string, T[]> {
  const groups = new Map<string, T[]>();
  for (const row of rows) {
    const k = key(row);
    const list = groups.get(k);
    if (list) list.push(row);
    else groups.set(k, [row]);
  }
  return groups;
}

function screeningsByOrbit(holdRadii: HoldRadiusRow[], screenings: ModelScreeningRow[]): Map<string, OrbitScreenings> {
  const byOrbit = new Map<string, OrbitScreenings>();
  const entry = (orbitId: string) => {
    let e = byOrbit.get(orbitId);
    if (!e) {
      e = { holdRadius: null, bicircular: null, elliptic: null };
      byOrbit.set(orbitId, e);
    }
    return e;
  };
  for (const h of holdRadii) entry(h.orbitId).holdRadius = h;
  for (const m of screenings) entry(m.orbitId)[m.model] = m;
  return byOrbit;
}

export function readCatalogSnapshot(dbPath: string): CatalogSnapshot {
  const reader = openCatalogForRead(dbPath);
  try {
    const systems = reader.systems();
    const families = reader.families();
    const orbits = reader.orbits();
    const stableWindows = reader.stableWindows();
    const bifurcations = reader.bifurcations();
    const holdRadii = reader.holdRadii();
    const modelScreenings = reader.modelScreenings();
    const orbitsByFamily = groupBy(orbits, (o) => o.familyId);
    const windowsByFamily = groupBy(stableWindows, (w) => w.familyId);
    const bifurcationsByFamily = groupBy(bifurcations, (b) => b.familyId);
    const screenings = screeningsByOrbit(holdRadii, modelScreenings);
    const screenedOrbitIds = new Set(screenings.keys());
    const pagedOrbitsByFamily = new Map([...orbitsByFamily].map(([familyId, members]) => [familyId, pagedMembers({
      members, windows: windowsByFamily.get(familyId) ?? [], bifurcations: bifurcationsByFamily.get(familyId) ?? [], screenedOrbitIds,
    })]));
    const pagedOrbits = [...pagedOrbitsByFamily.values()].flat();
    return {
      dbPath,
      scenario: reader.scenario(),
      systems,
      runs: reader.runs(),
      families,
      orbits,
      stableWindows,
      bifurcations,
      holdRadii,
      modelScreenings,
      systemById: new Map(systems.map((s) => [s.id, s])),
      familyById: new Map(families.map((f) => [f.id, f])),
      orbitById: new Map(orbits.map((o) => [o.id, o])),
      orbitsByFamily,
      pagedOrbits,
      pagedOrbitsByFamily,
      pagedOrbitIds: new Set(pagedOrbits.map((o) => o.id)),
      windowsByFamily,
      bifurcationsByFamily,
      holdRadiiByFamily: groupBy(holdRadii, (h) => h.familyId),
      signatureChangesByFamily: groupBy(reader.signatureChanges(), (c) => c.familyId),
      screeningsByOrbit: screenings,
    };
  } finally {
    reader.close();
  }
}

const snapshots = new Map<string, CatalogSnapshot>();

/** The snapshot of the build's catalog, read on first use and kept for every page of the build. */
export function loadCatalog(dbPath = catalogDbPath()): CatalogSnapshot {
  let snapshot = snapshots.get(dbPath);
  if (!snapshot) {
    snapshot = readCatalogSnapshot(dbPath);
    snapshots.set(dbPath, snapshot);
  }
  return snapshot;
}

export function requireFamily(catalog: CatalogSnapshot, familyId: string): { family: FamilyRow; system: SystemRow } {
  const family = catalog.familyById.get(familyId);
  if (!family) throw new Error(`family ${JSON.stringify(familyId)} is not in the catalog`);
  const system = catalog.systemById.get(family.systemId);
  if (!system) throw new Error(`family ${family.id}: system ${JSON.stringify(family.systemId)} is not in the catalog`);
  return { family, system };
}
