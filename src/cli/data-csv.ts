import type { DataTable, Datum } from '../scene/types.js';

/**
 * Text cells a spreadsheet would run as a formula (= + - @, and tab or carriage return, which
 * some spreadsheets strip before one): written with a leading single quote, as OWASP's "CSV
 * Injection" advice has it (common practice; the quote shows in the cell). Numbers are never
 * guarded: a negative number is written as the number it is.
 */
const FORMULA_START = /^[=+\-@\t\r]/;

/** RFC 4180: a field holding a comma, a double quote, CR or LF is quoted, its quotes doubled. */
function quoted(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

/** One cell: numbers plainly with every digit JavaScript keeps (the shortest text that reads back as the same number), no value as an empty cell. */
export function csvCell(value: Datum[string] | undefined): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value === 0 ? 0 : value) : '';
  if (typeof value === 'boolean') return String(value);
  return quoted(FORMULA_START.test(value) ? `'${value}` : value);
}

/** The table as CSV (RFC 4180: a header row, CRLF after every record), UTF-8 text. */
export function tableCsv(table: DataTable): string {
  const lines = [table.columns.map((c) => csvCell(c)), ...table.rows.map((row) => table.columns.map((c) => csvCell(row[c])))];
  return lines.map((cells) => `${cells.join(',')}\r\n`).join('');
}
