// The finder's filters written as SQL over the catalog file: the independent reference the finder's
// browser-side filter is checked against (same meaning, different code path), by the filters' URL keys.
import type { FinderFilter } from '../../site/scripts/finder/finder-filter.ts';

export function finderSql(filter: FinderFilter): { sql: string; params: unknown[] } {
  const where: string[] = [];
  const params: unknown[] = [];
  const add = (clause: string, ...values: unknown[]) => {
    where.push(clause);
    params.push(...values);
  };
  const f = filter;
  if (f.sys !== undefined) add('f.system_id = ?', f.sys);
  if (f.fam !== undefined) add('o.family_id = ?', f.fam);
  if (f.sig !== undefined) add('o.signature = ?', f.sig);
  if (f.cmin !== undefined) add('o.jacobi >= ?', f.cmin);
  if (f.cmax !== undefined) add('o.jacobi <= ?', f.cmax);
  if (f.pmin !== undefined) add('o.period_days >= ?', f.pmin);
  if (f.pmax !== undefined) add('o.period_days <= ?', f.pmax);
  if (f.smmin !== undefined) add('o.period_days / s.synodic_period_days >= ?', f.smmin);
  if (f.smmax !== undefined) add('o.period_days / s.synodic_period_days <= ?', f.smmax);
  if (f.stable === true) add('o.stable = 1');
  if (f.nu !== undefined) add('abs(o.stability_index) <= ?', f.nu);
  if (f.vert === 'stable') add('abs(o.vertical_stability_index) < 1');
  if (f.vert === 'unstable') add('abs(o.vertical_stability_index) >= 1');
  if (f.a1min !== undefined) add('o.primary_min_alt_km >= ?', f.a1min);
  if (f.a1max !== undefined) add('o.primary_min_alt_km <= ?', f.a1max);
  if (f.a2min !== undefined) add('o.secondary_min_alt_km >= ?', f.a2min);
  if (f.a2max !== undefined) add('o.secondary_min_alt_km <= ?', f.a2max);
  if (f.lock === 'any') add('o.synodic_p IS NOT NULL AND o.synodic_q IS NOT NULL');
  else if (f.lock !== undefined) add("(o.synodic_p || ':' || o.synodic_q) = ?", f.lock);
  // Screening bounds: an unscreened orbit has NULL there, and NULL >= x is not true, so it drops out.
  if (f.hmin !== undefined) add('h.hold_radius_km >= ?', f.hmin);
  if (f.sunmin !== undefined) add('sb.surviving_fraction >= ?', f.sunmin);
  if (f.eccmin !== undefined) add('se.surviving_fraction >= ?', f.eccmin);
  const joins = [
    'JOIN families f ON f.id = o.family_id',
    'JOIN systems s ON s.id = f.system_id',
    'LEFT JOIN hold_radii h ON h.orbit_id = o.id',
    "LEFT JOIN model_screenings sb ON sb.orbit_id = o.id AND sb.model = 'bicircular'",
    "LEFT JOIN model_screenings se ON se.orbit_id = o.id AND se.model = 'elliptic'",
  ].join(' ');
  const sql = `SELECT o.id FROM orbits o ${joins}${where.length ? ` WHERE ${where.join(' AND ')}` : ''} ORDER BY o.family_id, o.seq`;
  return { sql, params };
}
