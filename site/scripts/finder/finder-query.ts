// Finder state ⇄ URL query, so a filtered view can be shared and bookmarked. The parameter names are the
// URL keys of the orbit-field table's filters, plus sort, dir and page.
import { FINDER_FIELDS } from '../../../catalog-db/orbit-fields.ts';
import type { FieldFilter } from '../../../catalog-db/orbit-field-types.ts';
import type { FinderFilter } from './finder-filter.ts';
import { isSortKey, type SortDirection } from './finder-sort.ts';

export interface FinderState {
  filter: FinderFilter;
  /** A sortable field's key. */
  sort: string;
  direction: SortDirection;
  page: number; // 0-based
}

export const DEFAULT_STATE: FinderState = { filter: {}, sort: 'orbit', direction: 'asc', page: 0 };

/** Every URL key with what it holds, in table order. */
function urlKeys(): Array<[string, 'number' | 'text' | 'flag']> {
  const keys: Array<[string, 'number' | 'text' | 'flag']> = [];
  const add = (spec: FieldFilter) => {
    if (spec.kind === 'range') {
      if (spec.minKey !== undefined) keys.push([spec.minKey, 'number']);
      if (spec.maxKey !== undefined) keys.push([spec.maxKey, 'number']);
    } else keys.push([spec.key, spec.kind === 'absMax' ? 'number' : spec.kind === 'flag' ? 'flag' : 'text']);
  };
  for (const field of FINDER_FIELDS) if (field.filter !== null) add(field.filter);
  return keys;
}
const URL_KEYS = urlKeys();

export function stateToQuery(state: FinderState): string {
  const q = new URLSearchParams();
  for (const [key, kind] of URL_KEYS) {
    const v = state.filter[key];
    if (v === undefined || v === false) continue;
    q.set(key, kind === 'flag' ? '1' : String(v));
  }
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
  const filter: FinderFilter = {};
  for (const [key, kind] of URL_KEYS) {
    const raw = q.get(key);
    if (raw === null || raw.trim() === '') continue;
    if (kind === 'flag') {
      if (raw === '1') filter[key] = true;
    } else if (kind === 'text') filter[key] = raw;
    else if (Number.isFinite(Number(raw))) filter[key] = Number(raw);
  }
  const sort = q.get('sort') ?? '';
  const page = Number(q.get('page'));
  return {
    filter,
    sort: isSortKey(sort) ? sort : DEFAULT_STATE.sort,
    direction: q.get('dir') === 'desc' ? 'desc' : 'asc',
    page: Number.isInteger(page) && page > 1 ? page - 1 : 0,
  };
}
