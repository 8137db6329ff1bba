// The finder's filters written as SQL over the catalog file: the independent reference the finder's
// browser-side filter is checked against (same meaning, different code path).
import type { FinderFilter } from '../../site/scripts/finder/finder-filter.ts';

export function finderSql(filter: FinderFilter): { sql: string; params: unknown[] } {
  const where: string[] = [];
  const params: unknown[] = [];
  const add = (clause: string, ...values: unknown[]) => {
    where.push(clause);
    params.push(...values);
  };
  if (filter.system !== null) add('f.system_id = ?', filter.system);
  if (filter.family !== null) add('o.family_id = ?', filter.family);
  if (filter.signature !== null) add('o.signature = ?', filter.signature);
  if (filter.jacobiMin !== null) add('o.jacobi >= ?', filter.jacobiMin);
  if (filter.jacobiMax !== null) add('o.jacobi <= ?', filter.jacobiMax);
  if (filter.periodDaysMin !== null) add('o.period_days >= ?', filter.periodDaysMin);
  if (filter.periodDaysMax !== null) add('o.period_days <= ?', filter.periodDaysMax);
  if (filter.stableOnly) add('o.stable = 1');
  if (filter.nuAbsMax !== null) add('abs(o.stability_index) <= ?', filter.nuAbsMax);
  if (filter.vertical === 'stable') add('abs(o.vertical_stability_index) < 1');
  if (filter.vertical === 'unstable') add('abs(o.vertical_stability_index) >= 1');
  if (filter.primaryAltKmMin !== null) add('o.primary_min_alt_km >= ?', filter.primaryAltKmMin);
  if (filter.primaryAltKmMax !== null) add('o.primary_min_alt_km <= ?', filter.primaryAltKmMax);
  if (filter.secondaryAltKmMin !== null) add('o.secondary_min_alt_km >= ?', filter.secondaryAltKmMin);
  if (filter.secondaryAltKmMax !== null) add('o.secondary_min_alt_km <= ?', filter.secondaryAltKmMax);
  if (filter.lock === 'any') add('o.synodic_p IS NOT NULL AND o.synodic_q IS NOT NULL');
  else if (filter.lock !== null) add("(o.synodic_p || ':' || o.synodic_q) = ?", filter.lock);
  // Screening bounds: an unscreened orbit has NULL there, and NULL >= x is not true, so it drops out.
  if (filter.holdKmMin !== null) add('h.hold_radius_km >= ?', filter.holdKmMin);
  if (filter.sunFractionMin !== null) add('sb.surviving_fraction >= ?', filter.sunFractionMin);
  if (filter.eccFractionMin !== null) add('se.surviving_fraction >= ?', filter.eccFractionMin);
  const joins = [
    'JOIN families f ON f.id = o.family_id',
    'LEFT JOIN hold_radii h ON h.orbit_id = o.id',
    "LEFT JOIN model_screenings sb ON sb.orbit_id = o.id AND sb.model = 'bicircular'",
    "LEFT JOIN model_screenings se ON se.orbit_id = o.id AND se.model = 'elliptic'",
  ].join(' ');
  const sql = `SELECT o.id FROM orbits o ${joins}${where.length ? ` WHERE ${where.join(' AND ')}` : ''} ORDER BY o.family_id, o.seq`;
  return { sql, params };
}
