// One finder row as HTML, from its field values: the same function renders the first rows at build time
// and every page of rows in the browser. Columns, formats and the orbit link come from the orbit-field table.
import type { FieldValue, OrbitField, OrbitFieldSource } from '../../../catalog-db/orbit-field-types.ts';
import { FINDER_COLUMNS, FINDER_FIELDS } from '../../../catalog-db/orbit-fields.ts';
import { formatField } from '../../lib/format-field.ts';
import { idToPath } from '../../lib/id-path.ts';

const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };
const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (c) => ESCAPES[c]!);

function cellClass(field: OrbitField, value: FieldValue): string {
  if (field.type === 'flag') return value ? 'tag-cell stable' : 'tag-cell unstable';
  if (field.link) return 'link-cell'; // the orbit id, kept on one line
  return field.type === 'number' ? 'r num' : '';
}

/** `base` is the site's base path ("/" or "/sub/"). */
export function finderRowHtml(row: Record<string, FieldValue>, base: string): string {
  const id = String(row.orbitId);
  const cells = FINDER_COLUMNS.map((field) => {
    const value = row[field.key] ?? null;
    const text = escapeHtml(formatField(field, value));
    const content = field.link ? `<a href="${escapeHtml(`${base}orbit/${idToPath(id)}/`)}">${text}</a>` : text;
    const cls = cellClass(field, value);
    return `<td${cls ? ` class="${cls}"` : ''}>${content}</td>`;
  });
  return `<tr data-id="${escapeHtml(id)}">${cells.join('')}</tr>`;
}

/** A row's values straight from the catalog rows (the build's first rows), as rowValues reads them back. */
export function finderRowOfSource(source: OrbitFieldSource): Record<string, FieldValue> {
  return Object.fromEntries(FINDER_FIELDS.map((field) => [field.key, field.get(source)]));
}
