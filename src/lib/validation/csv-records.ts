import { parse } from 'csv-parse/sync';

// Reading an uploaded CSV into its records and their line numbers; shared by the survey, hydrograph and storage uploads.

export interface CsvIssue {
  /** 1-based line in the file; 0 for the file as a whole. */
  line: number;
  message: string;
}

export interface CsvRecords {
  records: string[][];
  lines: number[];
}

/** Blank lines and lines starting with # are skipped; cells are trimmed. */
export function csvRecords(text: string): CsvRecords | CsvIssue {
  try {
    const parsed = parse(text, { bom: true, relax_column_count: true, skip_empty_lines: true, comment: '#', trim: true, info: true }) as { record: string[]; info: { lines: number } }[];
    return { records: parsed.map((p) => p.record), lines: parsed.map((p) => p.info.lines) };
  } catch (error) {
    const line = typeof error === 'object' && error !== null && 'lines' in error && typeof error.lines === 'number' ? error.lines : 0;
    return { line, message: `cannot be read as CSV (${error instanceof Error ? error.message.replace(/^Invalid /, 'invalid ') : String(error)})` };
  }
}

/** "Time (h)" → time; units in brackets are allowed and ignored. */
export function csvColumnName(cell: string): string {
  return cell.toLowerCase().replace(/\(.*?\)|\[.*?\]/g, '').trim().replace(/[\s-]+/g, '_');
}

export const CSV_NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
