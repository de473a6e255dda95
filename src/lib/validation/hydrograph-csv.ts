import type { CaseUnits } from './case-schema';
import type { CsvIssue } from './csv-records';
import { MAX_HYDROGRAPH_POINTS } from './input-limits';
import { readNumberTable } from './number-table-csv';

// An inflow hydrograph as CSV, one row per point: time (hours from the start), discharge (m³/s, or ft³/s).
// Times start at 0 and rise strictly; every problem is reported with its line number before anything is stored.

export interface HydrographPoint {
  time: number;
  discharge: number;
}

export type HydrographCsvResult = { ok: true; points: HydrographPoint[] } | { ok: false; issues: CsvIssue[] };

export function parseHydrographCsv(text: string, units: CaseUnits): HydrographCsvResult {
  const discharge = units === 'US' ? 'ft³/s' : 'm³/s';
  const columns = [
    { name: 'time', what: 'time in hours from the start of the flood', nonNegative: true },
    { name: 'discharge', what: `inflow, ${discharge}`, nonNegative: true },
  ];
  const table = readNumberTable(text, [columns], 'a hydrograph CSV', MAX_HYDROGRAPH_POINTS);
  if (!table.ok) return table;
  const issues: CsvIssue[] = [];
  const { rows } = table;
  if (rows.length < 3) issues.push({ line: 0, message: `has ${rows.length} point${rows.length === 1 ? '' : 's'}: a hydrograph needs at least three` });
  if (rows[0] && rows[0].values[0] !== 0) issues.push({ line: rows[0].line, message: 'time must be 0 on the first row: the hydrograph starts at time 0' });
  rows.forEach((row, i) => {
    if (i > 0 && !(row.values[0] > rows[i - 1].values[0])) issues.push({ line: row.line, message: `time ${row.values[0]} h must be later than the time on the row before it (${rows[i - 1].values[0]} h)` });
  });
  if (rows.length > 0 && rows.every((r) => r.values[1] === 0)) issues.push({ line: 0, message: 'has no flow: every discharge is 0' });
  if (issues.length > 0) return { ok: false, issues };
  return { ok: true, points: rows.map((r) => ({ time: r.values[0], discharge: r.values[1] })) };
}
