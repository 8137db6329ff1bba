// What is wrong with a finder query, in words for the page: values that are not numbers (ignored), flags
// other than 1 (ignored), and ranges whose minimum lies above their maximum (no orbit can match).
import { FINDER_FIELDS } from '../../../catalog-db/orbit-fields.ts';
import { fieldLabel } from '../../lib/format-field.ts';

export function queryProblems(search: string): string[] {
  const q = new URLSearchParams(search);
  const problems: string[] = [];
  const given = (key: string | undefined): string | null => {
    const raw = key === undefined ? null : q.get(key);
    return raw === null || raw.trim() === '' ? null : raw.trim();
  };
  const number = (key: string | undefined, what: string): number | null => {
    const raw = given(key);
    if (raw === null) return null;
    const value = Number(raw);
    if (Number.isFinite(value)) return value;
    problems.push(`${what}: “${raw}” is not a number, so this bound is ignored.`);
    return null;
  };
  for (const field of FINDER_FIELDS) {
    const spec = field.filter;
    if (spec === null) continue;
    const label = fieldLabel(field, { unit: true });
    if (spec.kind === 'range') {
      const min = number(spec.minKey, `${label} minimum`);
      const max = number(spec.maxKey, `${label} maximum`);
      if (min !== null && max !== null && min > max) {
        problems.push(`${label}: the minimum ${min} is above the maximum ${max}, so no orbit can match.`);
      }
    } else if (spec.kind === 'absMax') {
      number(spec.key, `|${label}| at most`);
    } else if (spec.kind === 'flag') {
      const raw = given(spec.key);
      if (raw !== null && raw !== '1') problems.push(`${label}: “${raw}” is not 1, so this filter is ignored.`);
    }
  }
  return problems;
}
