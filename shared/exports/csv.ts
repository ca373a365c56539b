// CSV text for people who open it in a spreadsheet: one header row, then one row per record.
// A text cell that starts with =, +, -, @, a tab or a carriage return is one a spreadsheet may run
// as a formula; it is written with a leading apostrophe so it shows as text (OWASP, "CSV
// Injection"). Numbers are written as numbers, so a negative figure stays a figure.
// The package's browser build carries its own Buffer, so the same code runs in the browser and on Node.
import { stringify } from 'csv-stringify/browser/esm/sync';

export type CsvCell = string | number | boolean | null;
export type CsvColumn<R> = { header: string; value: (row: R) => CsvCell };

const FORMULA_START = /^[=+\-@\t\r]/;

/** The cell as a spreadsheet should show it: text that looks like a formula gets a leading apostrophe. */
export function neutraliseCell(cell: CsvCell): string | number {
  if (cell === null) return '';
  if (typeof cell === 'boolean') return cell ? 'yes' : 'no';
  if (typeof cell === 'number') return Number.isFinite(cell) ? cell : '';
  return FORMULA_START.test(cell) ? `'${cell}` : cell;
}

/**
 * The whole CSV text, header first, lines ending CRLF as RFC 4180 has them, and any cell holding a
 * line break quoted (with CRLF lines the writer would not quote a lone LF); a byte order mark
 * first, so spreadsheet programs read it as UTF-8 (names with accents, "×").
 */
export function csvText<R>(columns: CsvColumn<R>[], rows: R[]): string {
  const records = rows.map((r) => columns.map((c) => neutraliseCell(c.value(r))));
  return `\ufeff${stringify([columns.map((c) => neutraliseCell(c.header)), ...records], { record_delimiter: 'windows', quoted_match: /[\r\n]/ })}`;
}
