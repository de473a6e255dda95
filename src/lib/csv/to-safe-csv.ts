import { stringify } from 'csv-stringify/sync';

export type CsvCell = string | number | boolean | null | undefined;

// Spreadsheets run a cell that starts with = + - @ (or a tab or carriage return) as a formula. Such text cells are
// prefixed with a single quote so they open as text (OWASP, "CSV Injection"). Numbers are written as numbers,
// so a negative level stays a number.
const FORMULA_START = /^[=+\-@\t\r]/;

export function neutraliseFormula(cell: CsvCell): CsvCell {
  return typeof cell === 'string' && FORMULA_START.test(cell) ? `'${cell}` : cell;
}

/** RFC 4180 CSV (csv-stringify) of a header row and data rows, every text cell neutralised against formula injection. */
export function toSafeCsv(header: string[], rows: CsvCell[][]): string {
  return stringify([header, ...rows].map((row) => row.map(neutraliseFormula)), { record_delimiter: 'windows' });
}
