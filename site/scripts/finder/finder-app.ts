// Browser side of the orbit finder: loads the column file, keeps the form, the URL and the table in step,
// renders only the current page of rows, and saves the filtered set as CSV or JSON.
import type { FinderDataFile } from '../../lib/finder-data-types.ts';
import { rowsToCsv, rowsToJson } from './finder-export.ts';
import { filterRows } from './finder-filter.ts';
import { DEFAULT_STATE, queryToState, stateToQuery, type FinderState } from './finder-query.ts';
import { finderRowHtml } from './finder-row.ts';
import { queryProblems } from './query-problems.ts';
import { isSortKey, sortOrder } from './finder-sort.ts';
import { decodeFinderData, rowValues, type FinderTable } from './finder-table.ts';
import { saveTextFile } from '../save-text-file.ts';

const PAGE_SIZE = 50;

export async function startFinder(root: HTMLElement): Promise<void> {
  const form = root.querySelector<HTMLFormElement>('#finder-form')!;
  const tbody = root.querySelector<HTMLTableSectionElement>('#finder-rows')!;
  const countOut = root.querySelector<HTMLElement>('#finder-count')!;
  const timeOut = root.querySelector<HTMLElement>('#finder-time')!;
  const pageOut = root.querySelector<HTMLElement>('#finder-page')!;
  const prev = root.querySelector<HTMLButtonElement>('#finder-prev')!;
  const next = root.querySelector<HTMLButtonElement>('#finder-next')!;
  const base = root.dataset.base ?? '/';
  const status = root.querySelector<HTMLElement>('#finder-status')!;
  const problemsOut = root.querySelector<HTMLElement>('#finder-problems')!;
  for (const element of Array.from(root.querySelectorAll<HTMLElement>('[data-needs-js]'))) element.hidden = false;
  for (const element of Array.from(root.querySelectorAll('[data-no-js]'))) element.remove();
  status.textContent = 'Loading the orbit list…';

  let table: FinderTable;
  try {
    const response = await fetch(root.dataset.src!);
    if (!response.ok) throw new Error(`HTTP ${response.status}`);
    table = decodeFinderData((await response.json()) as FinderDataFile);
  } catch (error) {
    status.textContent = `The orbit list could not be loaded (${(error as Error).message}).`;
    status.classList.add('error');
    return;
  }
  status.textContent = '';

  let state: FinderState = queryToState(location.search);
  /** The query as typed (URL or form), before bad values are dropped: what the problems are about. */
  let rawQuery = location.search;
  let order = sortOrder(table, state.sort, state.direction);
  const hits = new Int32Array(table.n);
  let hitCount = 0;

  const writeForm = () => {
    const query = new URLSearchParams(stateToQuery({ ...state, sort: DEFAULT_STATE.sort, direction: 'asc', page: 0 }));
    for (const element of Array.from(form.elements) as Array<HTMLInputElement | HTMLSelectElement>) {
      if (!element.name) continue;
      if (element instanceof HTMLInputElement && element.type === 'checkbox') element.checked = query.get(element.name) === '1';
      else element.value = query.get(element.name) ?? '';
    }
  };
  const readForm = (): FinderState => {
    const query = new URLSearchParams();
    for (const element of Array.from(form.elements) as Array<HTMLInputElement | HTMLSelectElement>) {
      if (!element.name) continue;
      if (element instanceof HTMLInputElement && element.type === 'checkbox') {
        if (element.checked) query.set(element.name, '1');
      } else if (element.value.trim() !== '') query.set(element.name, element.value.trim());
    }
    rawQuery = query.toString();
    const parsed = queryToState(rawQuery);
    return { ...parsed, sort: state.sort, direction: state.direction, page: 0 };
  };

  const renderRows = () => {
    const pages = Math.max(1, Math.ceil(hitCount / PAGE_SIZE));
    state.page = Math.min(state.page, pages - 1);
    const from = state.page * PAGE_SIZE;
    const to = Math.min(hitCount, from + PAGE_SIZE);
    let html = '';
    for (let k = from; k < to; k++) html += finderRowHtml(rowValues(table, hits[k]!), base);
    tbody.innerHTML = html;
    pageOut.textContent = `page ${state.page + 1} of ${pages}`;
    prev.disabled = state.page === 0;
    next.disabled = state.page >= pages - 1;
  };

  const run = (pushUrl: boolean) => {
    const t0 = performance.now();
    hitCount = filterRows(table, state.filter, order, hits);
    const ms = performance.now() - t0;
    countOut.textContent = `${hitCount.toLocaleString('en-US')} of ${table.n.toLocaleString('en-US')} orbits`;
    countOut.dataset.count = String(hitCount);
    timeOut.dataset.ms = String(ms);
    renderRows();
    const problems = queryProblems(rawQuery);
    problemsOut.hidden = problems.length === 0;
    problemsOut.replaceChildren(...problems.map((text) => Object.assign(document.createElement('p'), { textContent: text })));
    const query = stateToQuery(state);
    const url = `${location.pathname}${query ? `?${query}` : ''}`;
    if (pushUrl) history.replaceState(null, '', url);
    root.dataset.ready = 'true';
  };

  const markSort = () => {
    for (const button of Array.from(root.querySelectorAll<HTMLButtonElement>('button[data-sort]'))) {
      const active = button.dataset.sort === state.sort;
      if (active) button.setAttribute('aria-sort-dir', state.direction);
      else button.removeAttribute('aria-sort-dir');
      button.closest('th')?.setAttribute('aria-sort', active ? (state.direction === 'asc' ? 'ascending' : 'descending') : 'none');
    }
  };

  form.addEventListener('input', () => {
    state = readForm();
    run(true);
  });
  form.addEventListener('submit', (event) => event.preventDefault());
  form.addEventListener('reset', () => {
    setTimeout(() => {
      state = { ...DEFAULT_STATE, sort: state.sort, direction: state.direction };
      rawQuery = '';
      run(true);
    });
  });
  root.querySelectorAll<HTMLButtonElement>('button[data-sort]').forEach((button) =>
    button.addEventListener('click', () => {
      const key = button.dataset.sort ?? '';
      if (!isSortKey(key)) return;
      state.direction = state.sort === key && state.direction === 'asc' ? 'desc' : 'asc';
      state.sort = key;
      state.page = 0;
      order = sortOrder(table, state.sort, state.direction);
      markSort();
      run(true);
    }),
  );
  prev.addEventListener('click', () => {
    state.page = Math.max(0, state.page - 1);
    run(true);
  });
  next.addEventListener('click', () => {
    state.page += 1;
    run(true);
  });
  root.querySelector('#finder-csv')!.addEventListener('click', () =>
    saveTextFile('orbits-filtered.csv', 'text/csv', rowsToCsv(table, hits, hitCount, stateToQuery(state))),
  );
  root.querySelector('#finder-json')!.addEventListener('click', () =>
    saveTextFile('orbits-filtered.json', 'application/json', rowsToJson(table, hits, hitCount, stateToQuery(state))),
  );

  writeForm();
  markSort();
  run(false);
}
