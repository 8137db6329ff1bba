// The one table of per-orbit fields. It drives the finder (columns, filters, sorting, URL state, its CSV
// and JSON), the orbit page's numbers and the catalog's CSV export. Adding a field: compute it, store it
// (schema + row mapping), one entry here, a test. Order: the finder's columns and the catalog CSV's columns
// (new catalog columns go last).
import { memberLabel } from './member-label.ts';
import type { OrbitField, OrbitFieldSource } from './orbit-field-types.ts';

const STATE_NAMES = ['x0', 'y0', 'z0', 'vx0', 'vy0', 'vz0'] as const;

/** p/q of a synodic lock written "p:q". */
function lockRatio(lock: string): number {
  const [p, q] = lock.split(':').map(Number);
  return p! / q!;
}

const synodicLock = ({ orbit }: OrbitFieldSource) => (orbit.synodicP !== null && orbit.synodicQ !== null ? `${orbit.synodicP}:${orbit.synodicQ}` : null);

type Entry = Partial<OrbitField> & Pick<OrbitField, 'key' | 'label' | 'get'>;
/** Defaults: a number read exactly, in both CSVs under its key, not in the finder or on the page. */
const field = (entry: Entry): OrbitField => ({
  unit: null, type: 'number', format: { style: 'exact' }, csv: entry.key, catalogCsv: true, finder: null, filter: null, sort: null,
  page: false, ...entry,
});

export const ORBIT_FIELDS: readonly OrbitField[] = [
  // Fields with catalogCsv: false are derived for the site; the catalog CSV keeps its columns as they were.
  field({
    key: 'orbit', label: 'Orbit', type: 'text', format: { style: 'text' }, csv: null, catalogCsv: false, finder: 'column', sort: 'catalog', link: true,
    get: (s) => `${s.family.name} ${memberLabel(s.orbit.seq)}`,
  }),
  field({ key: 'systemId', label: 'System', type: 'text', format: { style: 'text' }, catalogCsv: false, finder: 'data', filter: { kind: 'choice', key: 'sys' }, get: (s) => s.system.id }),
  field({ key: 'systemName', label: 'System', type: 'text', format: { style: 'text' }, csv: null, catalogCsv: false, finder: 'column', get: (s) => s.system.name }),
  field({ key: 'familyId', label: 'Family', type: 'text', format: { style: 'text' }, finder: 'data', filter: { kind: 'choice', key: 'fam' }, get: (s) => s.family.id }),
  field({ key: 'familySignature', label: 'Family lap signature', type: 'text', format: { style: 'text' }, get: (s) => s.family.signature }),
  field({ key: 'familyName', label: 'Family', type: 'text', format: { style: 'text' }, finder: 'data', get: (s) => s.family.name }),
  field({ key: 'orbitId', label: 'Orbit id', type: 'text', format: { style: 'text' }, finder: 'data', get: (s) => s.orbit.id }),
  field({ key: 'seq', label: 'Member', finder: 'data', get: (s) => s.orbit.seq }),
  // The generator run that computed the family: the finder's exports name its version and tolerances.
  field({ key: 'runId', label: 'Catalog run', catalogCsv: false, finder: 'data', get: (s) => s.family.runId }),
  field({ key: 'arclength', label: 'Arclength along family', format: { style: 'sig', digits: 8 }, page: true, get: (s) => s.orbit.arclength }),
  // In the finder's data for its exports (which add the same state in km, km/s: site/scripts/finder/export-columns.ts).
  ...STATE_NAMES.map((name, k) => field({ key: name, label: `${name} (start state)`, unit: k < 3 ? 'LU' : 'LU/TU', finder: 'data', get: (s) => s.orbit.state0[k]! })),
  field({
    key: 'jacobi', label: 'Jacobi constant C', finder: 'column', filter: { kind: 'range', minKey: 'cmin', maxKey: 'cmax' }, sort: 'value', page: true,
    get: (s) => s.orbit.jacobi,
  }),
  field({ key: 'period', label: 'Period (model time)', unit: 'TU', finder: 'data', page: true, get: (s) => s.orbit.period }),
  field({
    key: 'periodDays', label: 'Period', unit: 'd', format: { style: 'fixed', digits: 6 }, finder: 'column',
    filter: { kind: 'range', minKey: 'pmin', maxKey: 'pmax' }, sort: 'value', page: true, get: (s) => s.orbit.periodDays,
  }),
  field({
    key: 'periodSynodicMonths', label: 'Period in synodic months', format: { style: 'fixed', digits: 4 }, catalogCsv: false, finder: 'column',
    filter: { kind: 'range', minKey: 'smmin', maxKey: 'smmax' }, sort: 'value', page: true,
    get: (s) => (s.system.synodicPeriodDays === null ? null : s.orbit.periodDays / s.system.synodicPeriodDays),
  }),
  field({
    key: 'stabilityIndex', label: 'In-plane index ν', format: { style: 'index' }, finder: 'column', filter: { kind: 'absMax', key: 'nu' },
    sort: 'value', page: true, get: (s) => s.orbit.stabilityIndex,
  }),
  field({
    key: 'verticalStabilityIndex', label: 'Vertical index ν_z', format: { style: 'index' }, finder: 'column', sort: 'value', page: true,
    get: (s) => s.orbit.verticalStabilityIndex,
  }),
  field({
    key: 'verticalStability', label: 'Vertical stability', type: 'text', format: { style: 'text' }, catalogCsv: false, finder: 'data',
    filter: { kind: 'choice', key: 'vert' }, page: true, get: (s) => (Math.abs(s.orbit.verticalStabilityIndex) < 1 ? 'stable' : 'unstable'),
  }),
  field({
    key: 'stable', label: 'In-plane', type: 'flag', format: { style: 'flag', yes: 'stable', no: 'unstable' }, finder: 'column',
    filter: { kind: 'flag', key: 'stable' }, get: (s) => s.orbit.stable,
  }),
  field({ key: 'primaryMinRadiusKm', label: (b) => `Min. distance to ${b.primaryName}'s centre`, unit: 'km', format: { style: 'fixed', digits: 0 }, page: true, get: (s) => s.orbit.primaryMinRadiusKm }),
  field({
    key: 'primaryMinAltKm', label: (b) => `Min. altitude, ${b.primaryName}`, unit: 'km', format: { style: 'fixed', digits: 1 }, finder: 'column',
    filter: { kind: 'range', minKey: 'a1min', maxKey: 'a1max' }, sort: 'value', page: true, get: (s) => s.orbit.primaryMinAltKm,
  }),
  field({ key: 'secondaryMinRadiusKm', label: (b) => `Min. distance to ${b.secondaryName}'s centre`, unit: 'km', format: { style: 'fixed', digits: 0 }, page: true, get: (s) => s.orbit.secondaryMinRadiusKm }),
  field({
    key: 'secondaryMinAltKm', label: (b) => `Min. altitude, ${b.secondaryName}`, unit: 'km', format: { style: 'fixed', digits: 1 }, finder: 'column',
    filter: { kind: 'range', minKey: 'a2min', maxKey: 'a2max' }, sort: 'value', page: true, get: (s) => s.orbit.secondaryMinAltKm,
  }),
  field({ key: 'maxDistanceKm', label: 'Max. distance from barycentre', unit: 'km', format: { style: 'fixed', digits: 0 }, page: true, get: (s) => s.orbit.maxDistanceKm }),
  field({ key: 'l1Passages', label: 'Passages through the L1 neck', page: true, get: (s) => s.orbit.l1Passages }),
  field({
    key: 'signature', label: 'Lap signature', type: 'text', format: { style: 'text' }, finder: 'column', filter: { kind: 'choice', key: 'sig' },
    sort: 'value', get: (s) => s.orbit.signature,
  }),
  field({ key: 'synodicP', label: 'Synodic lock p', get: (s) => s.orbit.synodicP }),
  field({ key: 'synodicQ', label: 'Synodic lock q', get: (s) => s.orbit.synodicQ }),
  field({
    key: 'synodicLock', label: 'Synodic lock', type: 'text', format: { style: 'text' }, catalogCsv: false, finder: 'column',
    filter: { kind: 'choice', key: 'lock', anyValue: 'any' }, sort: 'value', compareText: (a, b) => lockRatio(a) - lockRatio(b), page: true, get: synodicLock,
  }),
  field({ key: 'synodicRelError', label: 'Synodic lock rel. error', format: { style: 'sig', digits: 3 }, finder: 'data', page: true, get: (s) => s.orbit.synodicRelError }),
  field({ key: 'closureError', label: 'Closure error', format: { style: 'sig', digits: 3 }, page: true, get: (s) => s.orbit.closureError }),
  field({ key: 'jacobiDrift', label: 'Jacobi drift', format: { style: 'sig', digits: 3 }, page: true, get: (s) => s.orbit.jacobiDrift }),
  // Empty where the member was not screened (or the model not run for it).
  field({
    key: 'holdRadiusKm', label: 'Hold radius', unit: 'km', format: { style: 'fixed', digits: 1 }, finder: 'column',
    filter: { kind: 'range', minKey: 'hmin' }, sort: 'value', get: (s) => s.holdRadiusKm,
  }),
  field({
    key: 'sunSurvivingFraction', label: 'Sun survival', format: { style: 'percent' }, finder: 'column', filter: { kind: 'range', minKey: 'sunmin' },
    sort: 'value', get: (s) => s.sunSurvivingFraction,
  }),
  field({
    key: 'eccentricitySurvivingFraction', label: 'Ecc. survival', format: { style: 'percent' }, finder: 'column',
    filter: { kind: 'range', minKey: 'eccmin' }, sort: 'value', get: (s) => s.eccentricitySurvivingFraction,
  }),
  // 1 or -1 on a vertically critical member (branch point of a spatial family), empty elsewhere.
  field({ key: 'verticalCriticalIndex', label: 'Vertical critical index', get: (s) => s.verticalCriticalIndex }),
];

export const FINDER_FIELDS: readonly OrbitField[] = ORBIT_FIELDS.filter((f) => f.finder !== null);
/** The finder's columns, in table order. */
export const FINDER_COLUMNS: readonly OrbitField[] = ORBIT_FIELDS.filter((f) => f.finder === 'column');
export const CATALOG_CSV_FIELDS: readonly OrbitField[] = ORBIT_FIELDS.filter((f) => f.catalogCsv && f.csv !== null);
