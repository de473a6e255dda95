import { describe, expect, it } from 'vitest';
import { parseHydrographCsv } from '@/lib/validation/hydrograph-csv';
import { MAX_HYDROGRAPH_POINTS, MAX_STORAGE_ROWS } from '@/lib/validation/input-limits';
import { parseStorageCsv } from '@/lib/validation/storage-csv';

describe('hydrograph CSV', () => {
  it('reads time and discharge, with units in the header', () => {
    const r = parseHydrographCsv('Time (h),Discharge (m³/s)\n0,1.5\n2,20\n# a comment\n6,4\n', 'SI');
    expect(r).toEqual({ ok: true, points: [{ time: 0, discharge: 1.5 }, { time: 2, discharge: 20 }, { time: 6, discharge: 4 }] });
  });

  it('reports every bad row with its line number', () => {
    const r = parseHydrographCsv('time,discharge\n0,1\n1,abc\n2,-3\n3\n', 'SI');
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.issues).toEqual([
      { line: 3, message: 'discharge "abc" is not a number (inflow, m³/s)' },
      { line: 4, message: 'discharge -3 must be 0 or more (inflow, m³/s)' },
      { line: 5, message: 'has 1 value; the header names 2 columns' },
    ]);
  });

  it('refuses times that do not start at 0 or do not rise, naming the line', () => {
    const r = parseHydrographCsv('time,discharge\n0.5,1\n2,5\n2,3\n', 'US');
    expect(r.ok ? [] : r.issues).toEqual([
      { line: 2, message: 'time must be 0 on the first row: the hydrograph starts at time 0' },
      { line: 4, message: 'time 2 h must be later than the time on the row before it (2 h)' },
    ]);
  });

  it('refuses a header it does not know and a file with too many points', () => {
    expect(parseHydrographCsv('hour,flow\n0,1\n', 'SI')).toMatchObject({ ok: false, issues: [{ line: 1, message: expect.stringContaining('time, discharge') }] });
    const rows = Array.from({ length: MAX_HYDROGRAPH_POINTS + 1 }, (_, i) => `${i},1`).join('\n');
    expect(parseHydrographCsv(`time,discharge\n${rows}\n`, 'SI')).toMatchObject({ ok: false, issues: [{ line: 0, message: expect.stringContaining(`at most ${MAX_HYDROGRAPH_POINTS}`) }] });
  });
});

describe('storage CSV', () => {
  it('reads a level–area table and a level–volume table', () => {
    expect(parseStorageCsv('level (m),area (m²)\n50,0\n52,1000\n', 'SI')).toEqual({ ok: true, storage: { kind: 'level-area', rows: [{ level: 50, area: 0 }, { level: 52, area: 1000 }] } });
    expect(parseStorageCsv('level,volume\n50,0\n52,1000\n', 'SI')).toEqual({ ok: true, storage: { kind: 'level-volume', rows: [{ level: 50, volume: 0 }, { level: 52, volume: 1000 }] } });
  });

  it('refuses levels that do not rise and volumes that do not grow, naming the line', () => {
    const r = parseStorageCsv('level,volume\n50,0\n49,10\n51,10\n', 'SI');
    expect(r.ok ? [] : r.issues).toEqual([
      { line: 3, message: 'level 49 m must be higher than the level on the row before it (50 m)' },
      { line: 4, message: 'volume 10 m³ must be greater than the volume on the row before it (10 m³)' },
    ]);
  });

  it('refuses too many rows', () => {
    const rows = Array.from({ length: MAX_STORAGE_ROWS + 1 }, (_, i) => `${i},${i + 1}`).join('\n');
    expect(parseStorageCsv(`level,area\n${rows}`, 'SI')).toMatchObject({ ok: false, issues: [{ line: 0, message: expect.stringContaining(`at most ${MAX_STORAGE_ROWS}`) }] });
  });
});
