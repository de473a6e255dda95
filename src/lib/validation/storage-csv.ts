import type { CaseUnits } from './case-schema';
import type { CsvIssue } from './csv-records';
import { MAX_STORAGE_ROWS } from './input-limits';
import { readNumberTable } from './number-table-csv';

// A reservoir's storage as CSV, one row per level: "level, area" (surface area at that level) or "level, volume"
// (volume stored below it). Levels rise strictly; every problem is reported with its line number before anything is stored.

export type StorageTable =
  | { kind: 'level-area'; rows: { level: number; area: number }[] }
  | { kind: 'level-volume'; rows: { level: number; volume: number }[] };

export type StorageCsvResult = { ok: true; storage: StorageTable } | { ok: false; issues: CsvIssue[] };

export function parseStorageCsv(text: string, units: CaseUnits): StorageCsvResult {
  const [length, area, volume] = units === 'US' ? ['ft', 'ft²', 'ft³'] : ['m', 'm²', 'm³'];
  const level = { name: 'level', what: `water level, ${length} above the datum` };
  const table = readNumberTable(
    text,
    [
      [level, { name: 'area', what: `surface area at that level, ${area}`, nonNegative: true }],
      [level, { name: 'volume', what: `volume stored below that level, ${volume}`, nonNegative: true }],
    ],
    'a storage CSV',
    MAX_STORAGE_ROWS,
  );
  if (!table.ok) return table;
  const kind = table.columns[1].name === 'area' ? 'level-area' : 'level-volume';
  const { rows } = table;
  const issues: CsvIssue[] = [];
  if (rows.length < 2) issues.push({ line: 0, message: 'has one row: a storage table needs at least two levels' });
  rows.forEach((row, i) => {
    const [h, v] = row.values;
    if (i === 0) return;
    const [hBefore, vBefore] = rows[i - 1].values;
    if (!(h > hBefore)) issues.push({ line: row.line, message: `level ${h} ${length} must be higher than the level on the row before it (${hBefore} ${length})` });
    if (kind === 'level-area' && !(v > 0)) issues.push({ line: row.line, message: `area must be greater than 0 ${area} above the lowest level` });
    if (kind === 'level-volume' && !(v > vBefore)) issues.push({ line: row.line, message: `volume ${v} ${volume} must be greater than the volume on the row before it (${vBefore} ${volume})` });
  });
  if (issues.length > 0) return { ok: false, issues };
  const storage: StorageTable =
    kind === 'level-area'
      ? { kind, rows: rows.map((r) => ({ level: r.values[0], area: r.values[1] })) }
      : { kind, rows: rows.map((r) => ({ level: r.values[0], volume: r.values[1] })) };
  return { ok: true, storage };
}
