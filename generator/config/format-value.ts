// How config values appear inside one-line error messages: short, unambiguous, never multi-line.

/** Numbers in plain or exponent form (1e-6 rather than 0.000001); strings quoted; others as short JSON. */
export function formatValue(value: unknown): string {
  if (typeof value === 'number') return formatNumber(value);
  if (typeof value === 'string') return shorten(JSON.stringify(value));
  if (value === undefined) return 'nothing';
  return shorten(JSON.stringify(value) ?? String(value));
}

/** At most 60 characters, so that a message stays one short line whatever the value. */
function shorten(text: string): string {
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}

export function formatNumber(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  const magnitude = Math.abs(value);
  if (magnitude !== 0 && (magnitude < 1e-3 || magnitude >= 1e7)) return value.toExponential().replace('e+', 'e');
  return String(value);
}

/** Range endpoints rounded for display, e.g. Jacobi constants to 5 decimals. */
export function formatRange(min: number, max: number, minOpen: boolean, maxOpen: boolean, digits?: number): string {
  const show = (v: number) => (digits === undefined ? formatNumber(v) : v.toFixed(digits));
  return `${minOpen ? '(' : '['}${show(min)}, ${show(max)}${maxOpen ? ')' : ']'}`;
}
