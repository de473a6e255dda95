import { excerpt } from '@/lib/case-words/excerpt';
import { CSV_NUMBER, type CsvIssue, csvColumnName, csvRecords } from './csv-records';

// A CSV of numbers under named columns (a hydrograph, a storage table): the header picks one of the accepted column
// sets, and every bad cell is reported with its line number, all at once.

export interface NumberColumn {
  name: string;
  /** What the column holds, with its unit, for the messages. */
  what: string;
  /** The value may not be negative. */
  nonNegative?: boolean;
}

export interface NumberRow {
  line: number;
  values: number[];
}

export type NumberTable = { ok: true; columns: readonly NumberColumn[]; rows: NumberRow[] } | { ok: false; issues: CsvIssue[] };

export const MAX_CSV_ISSUES = 200;

export function capIssues(issues: CsvIssue[]): CsvIssue[] {
  if (issues.length <= MAX_CSV_ISSUES) return issues;
  return [...issues.slice(0, MAX_CSV_ISSUES), { line: 0, message: `and ${issues.length - MAX_CSV_ISSUES} more problems not listed; correct these first` }];
}

function chosenColumns(header: string[], accepted: readonly (readonly NumberColumn[])[]): readonly NumberColumn[] | null {
  const names = header.map(csvColumnName);
  return accepted.find((set) => set.length === names.length && set.every((c, i) => c.name === names[i])) ?? null;
}

function rowOf(record: string[], line: number, columns: readonly NumberColumn[], issues: CsvIssue[]): NumberRow | null {
  if (record.length !== columns.length) {
    issues.push({ line, message: `has ${record.length} value${record.length === 1 ? '' : 's'}; the header names ${columns.length} columns` });
    return null;
  }
  const before = issues.length;
  const values = columns.map((c, i) => {
    const text = record[i];
    if (text === '') issues.push({ line, message: `${c.name} is empty: give the ${c.what}` });
    else if (!CSV_NUMBER.test(text)) issues.push({ line, message: `${c.name} "${excerpt(text)}" is not a number (${c.what})` });
    else if (c.nonNegative && Number(text) < 0) issues.push({ line, message: `${c.name} ${excerpt(text)} must be 0 or more (${c.what})` });
    return Number(text);
  });
  return issues.length > before ? null : { line, values };
}

/** Reads the table; `what` names the file in messages ("a hydrograph CSV"). */
export function readNumberTable(text: string, accepted: readonly (readonly NumberColumn[])[], what: string, maxRows: number): NumberTable {
  const help = `the first line must name the columns ${accepted.map((set) => set.map((c) => c.name).join(', ')).join(' or ')}`;
  if (text.includes('\u0000')) return { ok: false, issues: [{ line: 0, message: `is not a text file: ${what} is plain text` }] };
  const read = csvRecords(text);
  if ('message' in read) return { ok: false, issues: [read] };
  if (read.records.length === 0) return { ok: false, issues: [{ line: 0, message: `is empty: ${help}` }] };
  const columns = chosenColumns(read.records[0], accepted);
  if (columns === null) return { ok: false, issues: [{ line: read.lines[0], message: `does not name the expected columns ("${excerpt(read.records[0].join(', '))}"): ${help}` }] };
  if (read.records.length - 1 > maxRows) {
    return { ok: false, issues: [{ line: 0, message: `has too many rows: at most ${maxRows} (this one has ${read.records.length - 1}); reduce them to ${maxRows} or fewer` }] };
  }
  const issues: CsvIssue[] = [];
  const rows: NumberRow[] = [];
  for (let i = 1; i < read.records.length; i++) {
    const row = rowOf(read.records[i], read.lines[i], columns, issues);
    if (row) rows.push(row);
  }
  if (rows.length === 0 && issues.length === 0) issues.push({ line: 0, message: 'has a header but no rows' });
  return issues.length > 0 ? { ok: false, issues: capIssues(issues) } : { ok: true, columns, rows };
}
