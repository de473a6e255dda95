import type { CaseUnits } from './case-schema';
import { excerpt } from '@/lib/case-words/excerpt';
import { MAX_MANNING_N, MIN_MANNING_N } from './manning-range';

// Reading a survey CSV's header and rows into numbers, one line-numbered message per bad cell.

export interface SurveyRow {
  line: number;
  distanceUpstream: number;
  station: number;
  elevation: number;
  bank: 'left' | 'right' | null;
  /** Null when the cell is blank: the value above it in the same section carries on. */
  manningN: number | null;
}

interface Issue {
  line: number;
  message: string;
}

const REQUIRED = ['distance_upstream', 'station', 'elevation', 'manning_n'] as const;
const OPTIONAL = ['bank'] as const;
type Column = (typeof REQUIRED)[number] | (typeof OPTIONAL)[number];
const KNOWN: readonly string[] = [...REQUIRED, ...OPTIONAL];
const HEADER_HELP = `the first line must name the columns distance_upstream, station, elevation, manning_n and, optionally, bank`;

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/** "Distance upstream (m)" → distance_upstream; units in brackets are allowed and ignored. */
function columnName(cell: string): string {
  return cell.toLowerCase().replace(/\(.*?\)|\[.*?\]/g, '').trim().replace(/[\s-]+/g, '_');
}

function headerColumns(header: string[], line: number): { columns: Map<Column, number> } | { issues: Issue[] } {
  const names = header.map(columnName);
  const issues: Issue[] = [];
  names.forEach((name, i) => {
    if (!KNOWN.includes(name)) issues.push({ line, message: `column ${i + 1} "${excerpt(header[i])}" is not a survey column: ${HEADER_HELP}` });
    else if (names.indexOf(name) !== i) issues.push({ line, message: `the column ${name} appears twice` });
  });
  for (const name of REQUIRED) if (!names.includes(name)) issues.push({ line, message: `the column ${name} is missing: ${HEADER_HELP}` });
  if (issues.length > 0) return { issues };
  return { columns: new Map(names.map((name, i) => [name as Column, i])) };
}

function bankOf(cell: string): SurveyRow['bank'] | undefined {
  const v = cell.toLowerCase();
  if (v === '') return null;
  if (v === 'left' || v === 'l') return 'left';
  if (v === 'right' || v === 'r') return 'right';
  return undefined;
}

function rowOf(record: string[], line: number, columns: Map<Column, number>, units: CaseUnits, issues: Issue[]): SurveyRow | null {
  const length = units === 'US' ? 'ft' : 'm';
  if (record.length !== columns.size) {
    issues.push({ line, message: `has ${record.length} value${record.length === 1 ? '' : 's'}; the header names ${columns.size} columns` });
    return null;
  }
  const cell = (c: Column) => record[columns.get(c) ?? -1] ?? '';
  const before = issues.length;
  const number = (c: Column, what: string): number => {
    const text = cell(c);
    if (text === '') issues.push({ line, message: `${c} is empty: give the ${what}` });
    else if (!NUMBER.test(text)) issues.push({ line, message: `${c} "${excerpt(text)}" is not a number (${what})` });
    return Number(text);
  };
  const distanceUpstream = number('distance_upstream', `distance upstream from the structure, ${length}`);
  const station = number('station', `distance across the section from its left end, ${length}`);
  const elevation = number('elevation', `ground level, ${length} above the datum`);
  if (Number.isFinite(distanceUpstream) && distanceUpstream < 0) issues.push({ line, message: `distance_upstream ${excerpt(cell('distance_upstream'))} ${length} must be 0 ${length} or more (measured upstream from the structure)` });
  const nText = cell('manning_n');
  let manningN: number | null = null;
  if (nText !== '') {
    if (!NUMBER.test(nText)) issues.push({ line, message: `manning_n "${excerpt(nText)}" is not a number (Manning's n, dimensionless, typically 0.02–0.15)` });
    else if (!(Number(nText) >= MIN_MANNING_N && Number(nText) <= MAX_MANNING_N)) issues.push({ line, message: `manning_n ${excerpt(nText)} must be at least ${MIN_MANNING_N} and at most ${MAX_MANNING_N} (typically 0.02–0.15)` });
    manningN = Number(nText);
  }
  const bank = columns.has('bank') ? bankOf(cell('bank')) : null;
  if (bank === undefined) issues.push({ line, message: `bank "${excerpt(cell('bank'))}" must be blank, left or right` });
  if (issues.length > before) return null;
  return { line, distanceUpstream, station, elevation, bank: bank ?? null, manningN };
}

/** The header's columns and every row; header problems stop here, row problems are all collected. */
export function readSurveyRows(records: string[][], lines: number[], units: CaseUnits): { rows: SurveyRow[]; issues: Issue[] } {
  const header = headerColumns(records[0], lines[0]);
  if ('issues' in header) return { rows: [], issues: header.issues };
  const issues: Issue[] = [];
  const rows: SurveyRow[] = [];
  for (let i = 1; i < records.length; i++) {
    const row = rowOf(records[i], lines[i], header.columns, units, issues);
    if (row) rows.push(row);
  }
  if (rows.length === 0 && issues.length === 0) issues.push({ line: 0, message: 'has a header but no ground points: add one row per point' });
  return { rows, issues };
}
