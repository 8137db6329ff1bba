// Build-time: every orbit of the catalog as the finder's compact column file (numbers kept exact, so a
// filter in the browser selects exactly what the same query selects in SQLite).
import { FINDER_DATA_VERSION, type FinderDataFile } from '../scripts/finder/finder-data-types.ts';
import type { CatalogSnapshot } from './catalog-source.ts';

function indexer(): { index: (key: string) => number; list: string[] } {
  const list: string[] = [];
  const map = new Map<string, number>();
  return {
    list,
    index: (key) => {
      let i = map.get(key);
      if (i === undefined) {
        i = list.length;
        list.push(key);
        map.set(key, i);
      }
      return i;
    },
  };
}

export function finderData(catalog: CatalogSnapshot): FinderDataFile {
  const systemIndex = new Map(catalog.systems.map((s, i) => [s.id, i]));
  const familyIndex = new Map(catalog.families.map((f, i) => [f.id, i]));
  const signatures = indexer();
  const locks = indexer();
  const orbits = catalog.orbits;
  const columns: FinderDataFile['columns'] = {
    id: [], family: [], seq: [], signature: [], jacobi: [], periodDays: [], nu: [], nuV: [],
    primaryAltKm: [], secondaryAltKm: [], stable: [], lock: [], lockRelError: [], holdKm: [], sun: [], ecc: [],
  };
  for (const o of orbits) {
    columns.id.push(o.id);
    columns.family.push(familyIndex.get(o.familyId) ?? -1);
    columns.seq.push(o.seq);
    columns.signature.push(signatures.index(o.signature));
    columns.jacobi.push(o.jacobi);
    columns.periodDays.push(o.periodDays);
    columns.nu.push(o.stabilityIndex);
    columns.nuV.push(o.verticalStabilityIndex);
    columns.primaryAltKm.push(o.primaryMinAltKm);
    columns.secondaryAltKm.push(o.secondaryMinAltKm);
    columns.stable.push(o.stable ? 1 : 0);
    const hasLock = o.synodicP !== null && o.synodicQ !== null;
    columns.lock.push(hasLock ? locks.index(`${o.synodicP}:${o.synodicQ}`) : -1);
    columns.lockRelError.push(o.synodicRelError);
    const screenings = catalog.screeningsByOrbit.get(o.id);
    columns.holdKm.push(screenings?.holdRadius?.holdRadiusKm ?? null);
    columns.sun.push(screenings?.bicircular?.survivingFraction ?? null);
    columns.ecc.push(screenings?.elliptic?.survivingFraction ?? null);
  }
  return {
    version: FINDER_DATA_VERSION,
    systems: catalog.systems.map((s) => ({ id: s.id, name: s.name, primaryName: s.primaryName, secondaryName: s.secondaryName })),
    families: catalog.families.map((f) => ({ id: f.id, name: f.name, signature: f.signature, system: systemIndex.get(f.systemId) ?? -1 })),
    signatures: signatures.list,
    locks: locks.list,
    count: orbits.length,
    columns,
  };
}
