import { parse } from 'csv-parse/sync';
import { MAX_PARCELS, type ParcelInput, parcelSchema } from '@/lib/validation/parcel-schemas';
import { type CsvIssue, OPTIONAL_COLUMNS, PARCEL_COLUMNS, type ParcelColumn } from './parcel-columns';
import { excerpt } from '@/lib/case-words/excerpt';

// The parcels CSV: a header line naming the columns (parcel-columns.ts; any order, any case), then one line per parcel.
// Pure: no database, so the same parser checks a preview and an import.

export type { CsvIssue, ParcelColumn } from './parcel-columns';

const COLUMN_OF = Object.fromEntries(Object.entries(PARCEL_COLUMNS).map(([column, field]) => [field, column])) as Record<keyof ParcelInput, ParcelColumn>;

export interface CsvPreviewRow {
  line: number;
  values: Record<ParcelColumn, string>;
  parcel: ParcelInput | null;
}

export interface ParsedParcelsCsv {
  rows: CsvPreviewRow[];
  issues: CsvIssue[];
  /** Every row valid and at least one: the register can be stored. */
  ok: boolean;
}

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)$/;

function numberOrText(text: string): number | string | null {
  if (text === '') return null;
  return NUMBER.test(text) ? Number(text) : text;
}

function toCandidate(values: Record<ParcelColumn, string>): Record<keyof ParcelInput, unknown> {
  return {
    reference: values.parcel_reference,
    ownerName: values.owner_name,
    postalAddress: values.postal_address,
    email: values.email,
    distanceFromM: numberOrText(values.distance_from_m) ?? undefined,
    distanceToM: numberOrText(values.distance_to_m) ?? undefined,
    bankSide: values.bank_side.toLowerCase(),
    groundLevelM: numberOrText(values.ground_level_m),
    landUse: values.land_use,
  };
}

function rowIssues(line: number, values: Record<ParcelColumn, string>): { parcel: ParcelInput | null; issues: CsvIssue[] } {
  const parsed = parcelSchema.safeParse(toCandidate(values));
  if (parsed.success) return { parcel: parsed.data, issues: [] };
  const issues = parsed.error.issues.map((issue) => {
    const column = COLUMN_OF[issue.path[0] as keyof ParcelInput] ?? null;
    const found = column && values[column] !== '' && issue.code !== 'custom' ? ` (found "${excerpt(values[column])}")` : '';
    return { line, column, message: `${issue.message}${found}` };
  });
  return { parcel: null, issues };
}

function headerIssues(header: string[]): { columns: (ParcelColumn | null)[]; issues: CsvIssue[] } {
  const names = header.map((h) => h.trim().toLowerCase());
  const known = Object.keys(PARCEL_COLUMNS) as ParcelColumn[];
  const issues: CsvIssue[] = [];
  names.forEach((name, i) => {
    if (!known.includes(name as ParcelColumn)) issues.push({ line: 1, column: null, message: `column ${i + 1} "${excerpt(header[i])}" is not a parcels column; the columns are ${known.join(', ')}` });
    else if (names.indexOf(name) !== i) issues.push({ line: 1, column: name as ParcelColumn, message: `the column ${name} appears twice` });
  });
  for (const column of known) {
    if (!OPTIONAL_COLUMNS.includes(column) && !names.includes(column)) issues.push({ line: 1, column, message: `the header has no ${column} column (required)` });
  }
  return { columns: names.map((n) => (known.includes(n as ParcelColumn) ? (n as ParcelColumn) : null)), issues };
}

function readRecords(text: string): { records: { record: string[]; line: number }[]; issue: CsvIssue | null } {
  try {
    const parsed = parse(text, { bom: true, info: true, relax_column_count: true, skip_empty_lines: false, trim: true }) as { record: string[]; info: { lines: number } }[];
    // info.lines is the line a record ends on; a record starts on the line after the previous one ended (quoted addresses may span lines).
    return { records: parsed.map((p, i) => ({ record: p.record, line: i === 0 ? 1 : parsed[i - 1].info.lines + 1 })), issue: null };
  } catch (error) {
    const line = (error as { lines?: number }).lines ?? 1;
    return { records: [], issue: { line, column: null, message: `the file is not valid CSV: ${(error as Error).message}` } };
  }
}

/** Parses and checks the CSV text; every issue carries its line number and column. */
export function parseParcelsCsv(text: string): ParsedParcelsCsv {
  const { records, issue } = readRecords(text);
  if (issue) return { rows: [], issues: [issue], ok: false };
  if (records.length === 0) return { rows: [], issues: [{ line: 1, column: null, message: 'the file is empty: it needs a header line and one line per parcel' }], ok: false };
  const header = headerIssues(records[0].record);
  if (header.issues.length) return { rows: [], issues: header.issues, ok: false };

  const issues: CsvIssue[] = [];
  const rows: CsvPreviewRow[] = [];
  const seen = new Map<string, number>();
  for (const { record, line } of records.slice(1)) {
    if (record.every((cell) => cell === '')) continue;
    if (record.length !== header.columns.length) issues.push({ line, column: null, message: `has ${record.length} fields; the header has ${header.columns.length}` });
    const values = Object.fromEntries((Object.keys(PARCEL_COLUMNS) as ParcelColumn[]).map((c) => [c, record[header.columns.indexOf(c)] ?? ''])) as Record<ParcelColumn, string>;
    const checked = rowIssues(line, values);
    issues.push(...checked.issues);
    const key = values.parcel_reference.toLowerCase();
    if (key && seen.has(key)) issues.push({ line, column: 'parcel_reference', message: `repeats the reference "${excerpt(values.parcel_reference)}" of line ${seen.get(key)}` });
    else if (key) seen.set(key, line);
    rows.push({ line, values, parcel: checked.parcel });
  }
  if (rows.length === 0) issues.push({ line: 2, column: null, message: 'the file has a header but no parcels' });
  if (rows.length > MAX_PARCELS) issues.push({ line: rows[MAX_PARCELS].line, column: null, message: `a register holds at most ${MAX_PARCELS} parcels; this file has ${rows.length}` });
  return { rows, issues, ok: issues.length === 0 };
}

export function formatCsvIssue(issue: CsvIssue): string {
  return `Line ${issue.line}${issue.column ? `, ${issue.column}` : ''}: ${issue.message}`;
}
