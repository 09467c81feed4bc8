/**
 * CSV as RFC 4180 describes it: fields separated by commas, records by CRLF; a field holding a
 * comma, a double quote, CR or LF is wrapped in double quotes with its quotes doubled.
 * Text that a spreadsheet would run as a formula (starting with =, +, -, @, tab or CR) is
 * prefixed with an apostrophe, as the OWASP "CSV Injection" guidance advises. Numbers are written as they are.
 */
export type CsvValue = string | number | boolean | null;

const FORMULA_START = /^[=+\-@\t\r]/;

function field(value: CsvValue): string {
  if (value === null) return '';
  if (typeof value !== 'string') return String(value);
  const text = FORMULA_START.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function toCsv(rows: CsvValue[][]): string {
  return rows.map((row) => row.map(field).join(',')).join('\r\n') + '\r\n';
}
