import { describe, expect, it } from 'vitest';
import { startOfDayIn, zoneDayRange } from '@/lib/dates/zone-day-range';

// The UK rule (common knowledge, the EU/UK summer-time rule): BST starts at 01:00 UTC on the last Sunday of March
// and ends at 01:00 UTC on the last Sunday of October, so in 2026 on 29 March and 25 October.
describe('a day in the portal’s zone as the UTC instants it spans', () => {
  it('a winter day in London is the UTC day', () => {
    expect(zoneDayRange('Europe/London', '2026-01-15')).toEqual({ from: '2026-01-15T00:00:00.000Z', before: '2026-01-16T00:00:00.000Z' });
  });

  it('a summer day in London starts at 23:00 UTC the evening before', () => {
    expect(zoneDayRange('Europe/London', '2026-07-01')).toEqual({ from: '2026-06-30T23:00:00.000Z', before: '2026-07-01T23:00:00.000Z' });
  });

  it('the day the clocks go forward is 23 hours long', () => {
    const day = zoneDayRange('Europe/London', '2026-03-29');
    expect(day).toEqual({ from: '2026-03-29T00:00:00.000Z', before: '2026-03-29T23:00:00.000Z' });
    expect(Date.parse(day.before) - Date.parse(day.from)).toBe(23 * 3_600_000);
  });

  it('the day the clocks go back is 25 hours long', () => {
    const day = zoneDayRange('Europe/London', '2026-10-25');
    expect(day).toEqual({ from: '2026-10-24T23:00:00.000Z', before: '2026-10-26T00:00:00.000Z' });
    expect(Date.parse(day.before) - Date.parse(day.from)).toBe(25 * 3_600_000);
  });

  it('a span of days across a change runs from the first day’s start to the end of the last', () => {
    expect(zoneDayRange('Europe/London', '2026-03-28', '2026-03-30')).toEqual({ from: '2026-03-28T00:00:00.000Z', before: '2026-03-30T23:00:00.000Z' });
  });

  it('in the UTC zone a day is the UTC day', () => {
    expect(zoneDayRange('UTC', '2026-10-25')).toEqual({ from: '2026-10-25T00:00:00.000Z', before: '2026-10-26T00:00:00.000Z' });
  });

  it('where the clocks skip midnight the day starts at 01:00', () => {
    // Recalled from memory, and as Node's zone data has it: São Paulo's summer time began at 00:00 on 4 November
    // 2018 (UTC−3 to UTC−2), so that day began at 01:00 local time, 03:00 UTC.
    expect(startOfDayIn('America/Sao_Paulo', '2018-11-04').toISOString()).toBe('2018-11-04T03:00:00.000Z');
    expect(startOfDayIn('America/Sao_Paulo', '2018-11-03').toISOString()).toBe('2018-11-03T03:00:00.000Z');
  });

  it('a zone east of Greenwich with a half-hour offset', () => {
    // India keeps UTC+5:30 all year (common knowledge).
    expect(startOfDayIn('Asia/Kolkata', '2026-01-01').toISOString()).toBe('2025-12-31T18:30:00.000Z');
  });

  it('refuses what is not a date', () => {
    expect(() => startOfDayIn('Europe/London', 'soon')).toThrow(RangeError);
  });
});
