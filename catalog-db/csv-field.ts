// One CSV field as RFC 4180 wants it: quoted when it holds a comma, quote or line break.
// Numbers go through String(n), the shortest text that reads back as the same double.
export type CsvValue = string | number | boolean | null;

export function formatCsvField(value: CsvValue): string {
  if (value === null) return '';
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  return /[",\r\n]/.test(value) ? `"${value.replaceAll('"', '""')}"` : value;
}

/** Records end with CRLF (RFC 4180, section 2). */
export function formatCsvRecord(values: readonly CsvValue[]): string {
  return `${values.map(formatCsvField).join(',')}\r\n`;
}
