// What a bulk export says about itself, as fields of the JSON and as comment lines at the top of the CSV:
// the filter, the systems (μ, LU, TU and their source), the frame and units, and the catalog runs that
// computed the rows with their integrator tolerances. Only the systems and runs of the exported rows.
import type { FinderRunInfo, FinderSystemInfo } from '../../lib/finder-data-types.ts';
import type { FinderTable } from './finder-table.ts';
import { EXPORT_COLUMNS } from './export-columns.ts';

export interface ExportMetadata {
  exportedFrom: string;
  query: string;
  count: number;
  frame: string;
  systems: Array<FinderSystemInfo & { timeUnitDays: number }>;
  runs: FinderRunInfo[];
  /** Unit of each column that has one. */
  units: Record<string, string>;
}

export const EXPORT_FRAME =
  'CR3BP rotating frame (not an ephemeris frame): origin at the barycentre, x from the larger body toward the smaller, z along the ' +
  'rotation; start states at t = 0 nondimensional (LU, LU/TU) and the same in km and km/s (times LU, LU/TU); periods in TU and days';

const SECONDS_PER_DAY = 86_400;

export function exportMetadata(table: FinderTable, rows: Int32Array, count: number, query: string): ExportMetadata {
  const systemIds = new Set<string>();
  const runIds = new Set<number>();
  const systemColumn = table.texts.systemId!;
  const runColumn = table.numbers.runId!;
  for (let k = 0; k < count; k++) {
    const i = rows[k]!;
    const code = systemColumn.codes[i]!;
    if (code >= 0) systemIds.add(systemColumn.dict[code]!);
    runIds.add(runColumn[i]!);
  }
  return {
    exportedFrom: 'cycler-atlas orbit finder',
    query,
    count,
    frame: EXPORT_FRAME,
    systems: table.systems.filter((s) => systemIds.has(s.id)).map((s) => ({ ...s, timeUnitDays: s.timeUnitS / SECONDS_PER_DAY })),
    runs: table.runs.filter((r) => runIds.has(r.id)),
    units: Object.fromEntries(EXPORT_COLUMNS.filter((c) => c.unit !== null).map((c) => [c.key, c.unit!])),
  };
}

/** One line of text, whatever a name holds (a comment line must not break). */
const oneLine = (text: string) => text.replace(/[\r\n]+/g, ' ');

/** The metadata as CSV comment lines ("# ..."), each ending in CRLF like the records. */
export function metadataCommentLines(meta: ExportMetadata): string {
  const lines = [
    `${meta.exportedFrom}: ${meta.count} orbits; filter: ${meta.query === '' ? 'none' : meta.query}`,
    `frame: ${meta.frame}`,
    ...meta.systems.map((s) =>
      `system ${s.id} (${s.name}): mu = ${s.mu}; LU = ${s.lengthUnitKm} km; TU = ${s.timeUnitS} s = ${s.timeUnitDays} d; ` +
      `larger body ${s.primaryName} at x = -mu, smaller body ${s.secondaryName} at x = 1 - mu; constants: ${s.source}`),
    ...meta.runs.map((r) =>
      `catalog run ${r.id}: generator ${r.generatorVersion}, commit ${r.gitCommit}, scenario ${r.scenarioName}; ` +
      `tolerance rtol = ${r.rtol}, atol = ${r.atol}; started ${r.startedAt}, finished ${r.finishedAt ?? 'not finished'}`),
    `units: ${Object.entries(meta.units).map(([key, unit]) => `${key} ${unit}`).join(', ')}`,
    'lines starting with # are comments; the first other line is the header',
  ];
  return lines.map((line) => `# ${oneLine(line)}\r\n`).join('');
}
