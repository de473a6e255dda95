import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { MAX_HYDROGRAPH_POINTS, MAX_STORAGE_ROWS } from '@/lib/validation/input-limits';
import { parseCase } from '@/lib/validation/parse-case';

const demo = () => JSON.parse(readFileSync('db/seeds/cases/wendle-harrowfield-reservoir-spillway.json', 'utf8')) as Record<string, unknown> & { events: Record<string, unknown>[] };
const issues = (raw: unknown) => {
  const p = parseCase(raw);
  return p.ok ? [] : p.issues;
};

describe('the case file with routing', () => {
  it('accepts the routed demo, taking the discharge of a table event from its peak', () => {
    const p = parseCase(demo());
    expect(p.ok).toBe(true);
    if (p.ok) expect(p.value.events[0].discharge).toBe(30);
  });

  it('refuses an event discharge more than 1 % from its table peak', () => {
    const raw = demo();
    raw.events[0] = { ...raw.events[0], discharge: 31 };
    expect(issues(raw)).toEqual([{ path: 'events[0].discharge', message: expect.stringContaining('differs from the peak of the inflow hydrograph (30 m³/s) by more than 1 %') }]);
    raw.events[0] = { ...raw.events[0], discharge: 30.2 };
    expect(issues(raw)).toEqual([]);
  });

  it('refuses a hydrograph without a reservoir, naming both', () => {
    const { reservoir: _r, ...raw } = demo();
    const found = issues(raw);
    expect(found.map((i) => i.path)).toEqual(['events[0].hydrograph', 'events[1].hydrograph']);
    expect(found[0].message).toContain('give the reservoir');
  });

  it('refuses a reservoir behind a fixed-depth control: it has no rating', () => {
    expect(issues({ ...demo(), control: { type: 'depth', depth: 4 } })).toEqual([{ path: 'reservoir', message: expect.stringContaining('has no rating') }]);
  });

  it('refuses hydrograph tables that do not start at 0 or whose times do not rise', () => {
    const raw = demo();
    raw.events[0] = { ...raw.events[0], hydrograph: { kind: 'table', points: [{ time: 1, discharge: 1 }, { time: 3, discharge: 5 }, { time: 2, discharge: 1 }] } };
    expect(issues(raw).map((i) => i.path)).toEqual(['events[0].hydrograph.points[0].time', 'events[0].hydrograph.points[2].time']);
  });

  it('caps the hydrograph points and the storage rows, naming the field', () => {
    const raw = demo();
    raw.events[0] = { name: 'long', hydrograph: { kind: 'table', points: Array.from({ length: MAX_HYDROGRAPH_POINTS + 1 }, (_, i) => ({ time: i, discharge: 5 })) } };
    expect(issues(raw)).toEqual([{ path: 'events[0].hydrograph.points', message: expect.stringContaining(`at most ${MAX_HYDROGRAPH_POINTS} in one hydrograph`) }]);
    const rows = Array.from({ length: MAX_STORAGE_ROWS + 1 }, (_, i) => ({ level: 50 + i / 10, area: 1000 + i }));
    expect(issues({ ...demo(), reservoir: { storage: { kind: 'level-area', rows } } })).toEqual([{ path: 'reservoir.storage.rows', message: expect.stringContaining(`at most ${MAX_STORAGE_ROWS} in one storage table`) }]);
  });

  it('refuses storage rows whose volumes do not grow', () => {
    const storage = { kind: 'level-volume', rows: [{ level: 50, volume: 0 }, { level: 51, volume: 0 }] };
    expect(issues({ ...demo(), reservoir: { storage } })).toEqual([{ path: 'reservoir.storage.rows[1].volume', message: 'must be greater than the volume of the row before it' }]);
  });
});
