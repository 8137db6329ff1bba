// One orbit field's value as text for reading (finder cells, orbit page numbers), by the field's format
// in the orbit-field table; a dash where there is no value.
import type { FieldValue, OrbitField } from '../../catalog-db/orbit-field-types.ts';
import { formatExact, formatFixed, formatPercent, formatSig } from '../format/format-number.ts';
import { formatStabilityIndex } from '../format/format-stability-index.ts';

const DASH = '—';

export function formatField(field: OrbitField, value: FieldValue, withUnit = false): string {
  if (value === null || (typeof value === 'number' && Number.isNaN(value))) return DASH;
  const f = field.format;
  let text: string;
  if (f.style === 'flag') text = value ? f.yes : f.no;
  else if (typeof value !== 'number') text = String(value);
  else if (f.style === 'sig') text = formatSig(value, f.digits);
  else if (f.style === 'fixed') text = formatFixed(value, f.digits);
  else if (f.style === 'percent') text = formatPercent(value);
  else if (f.style === 'index') text = formatStabilityIndex(value);
  else text = formatExact(value);
  return withUnit && field.unit !== null ? `${text} ${field.unit}` : text;
}

/** The field's label, with its unit in brackets when asked; bodies name the primaries where the label does. */
export function fieldLabel(field: OrbitField, options: { unit?: boolean; bodies?: { primaryName: string; secondaryName: string } } = {}): string {
  const bodies = options.bodies ?? { primaryName: 'larger body', secondaryName: 'smaller body' };
  const label = typeof field.label === 'string' ? field.label : field.label(bodies);
  return options.unit && field.unit !== null ? `${label} (${field.unit})` : label;
}
