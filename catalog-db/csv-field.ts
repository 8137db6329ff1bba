// One CSV field as RFC 4180 wants it: quoted when it holds a comma, quote or line break.
// Numbers go through String(n), the shortest text that reads back as the same double.
// Text that a spreadsheet would run as a formula (it begins with =, +, -, @, a tab or a carriage
// return) gets a leading apostrophe, as common practice for CSV meant for spreadsheets (OWASP, "CSV
// Injection"); numbers are numbers here, so a negative number is never touched.
export type CsvValue = string | number | boolean | null;

const FORMULA_START = /^[=+\-@\t\r]/;

export function formatCsvField(value: CsvValue): string {
  if (value === null) return '';
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  const text = FORMULA_START.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

/** Records end with CRLF (RFC 4180, section 2). */
export function formatCsvRecord(values: readonly CsvValue[]): string {
  return `${values.map(formatCsvField).join(',')}\r\n`;
}
