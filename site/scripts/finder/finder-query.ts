// Finder state ⇄ URL query, so a filtered view can be shared and bookmarked. Short, stable parameter names.
import { EMPTY_FILTER, type FinderFilter, type VerticalFilter } from './finder-filter.ts';
import { isSortKey, type SortDirection, type SortKey } from './finder-sort.ts';

export interface FinderState {
  filter: FinderFilter;
  sort: SortKey;
  direction: SortDirection;
  page: number; // 0-based
}

export const DEFAULT_STATE: FinderState = { filter: EMPTY_FILTER, sort: 'orbit', direction: 'asc', page: 0 };

const NUMBER_PARAMS = {
  cmin: 'jacobiMin', cmax: 'jacobiMax', pmin: 'periodDaysMin', pmax: 'periodDaysMax', nu: 'nuAbsMax',
  a1min: 'primaryAltKmMin', a1max: 'primaryAltKmMax', a2min: 'secondaryAltKmMin', a2max: 'secondaryAltKmMax',
  hmin: 'holdKmMin', sunmin: 'sunFractionMin', eccmin: 'eccFractionMin',
} as const satisfies Record<string, keyof FinderFilter>;

const TEXT_PARAMS = { sys: 'system', fam: 'family', sig: 'signature', lock: 'lock' } as const satisfies Record<string, keyof FinderFilter>;

export function stateToQuery(state: FinderState): string {
  const q = new URLSearchParams();
  const f = state.filter;
  for (const [param, field] of Object.entries(TEXT_PARAMS)) {
    const v = f[field];
    if (v !== null) q.set(param, v);
  }
  for (const [param, field] of Object.entries(NUMBER_PARAMS)) {
    const v = f[field];
    if (v !== null) q.set(param, String(v));
  }
  if (f.stableOnly) q.set('stable', '1');
  if (f.vertical !== 'any') q.set('vert', f.vertical);
  if (state.sort !== DEFAULT_STATE.sort || state.direction !== DEFAULT_STATE.direction) {
    q.set('sort', state.sort);
    q.set('dir', state.direction);
  }
  if (state.page > 0) q.set('page', String(state.page + 1));
  return q.toString();
}

/** Reads a query; unknown or malformed values fall back to "no bound" rather than failing the page. */
export function queryToState(search: string): FinderState {
  const q = new URLSearchParams(search);
  const filter: FinderFilter = { ...EMPTY_FILTER };
  for (const [param, field] of Object.entries(TEXT_PARAMS)) {
    const v = q.get(param);
    if (v !== null && v !== '') filter[field] = v;
  }
  for (const [param, field] of Object.entries(NUMBER_PARAMS)) {
    const raw = q.get(param);
    const v = raw === null || raw.trim() === '' ? NaN : Number(raw);
    if (Number.isFinite(v)) filter[field] = v;
  }
  filter.stableOnly = q.get('stable') === '1';
  const vert = q.get('vert');
  filter.vertical = vert === 'stable' || vert === 'unstable' ? (vert as VerticalFilter) : 'any';
  const sort = q.get('sort') ?? '';
  const page = Number(q.get('page'));
  return {
    filter,
    sort: isSortKey(sort) ? sort : DEFAULT_STATE.sort,
    direction: q.get('dir') === 'desc' ? 'desc' : 'asc',
    page: Number.isInteger(page) && page > 1 ? page - 1 : 0,
  };
}
