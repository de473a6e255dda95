// The UTC instants that bound a calendar day in a time zone, for filters that take a day and query stored instants.
// Pure: the zone is always passed in. A day is 23 or 25 hours long when the clocks change within it.
import { addDays, calendarDateIn } from './calendar-dates';

const DAY_MS = 86_400_000;

/** How far the zone's clocks are ahead of UTC at an instant, in milliseconds (negative west of Greenwich). */
export function zoneOffsetMs(timeZone: string, instant: number): number {
  const parts = new Intl.DateTimeFormat('en-GB', { timeZone, hourCycle: 'h23', year: 'numeric', month: 'numeric', day: 'numeric', hour: 'numeric', minute: 'numeric', second: 'numeric' }).formatToParts(new Date(instant));
  const part = (type: Intl.DateTimeFormatPartTypes) => Number(parts.find((p) => p.type === type)?.value);
  const wall = Date.UTC(part('year'), part('month') - 1, part('day'), part('hour'), part('minute'), part('second'));
  return wall - (instant - (((instant % 1000) + 1000) % 1000));
}

/**
 * The first instant of a calendar day in a zone. Midnight is tried with the offsets in force a day either side (the
 * clocks change at most once in that span); of the instants that fall on the day, the earliest is its start. That
 * also covers zones whose clocks skip midnight (the day then starts at 01:00) or show it twice (the first one).
 */
export function startOfDayIn(timeZone: string, isoDate: string): Date {
  const midnight = Date.parse(`${isoDate}T00:00:00Z`);
  if (!Number.isFinite(midnight)) throw new RangeError(`not an ISO date: ${isoDate}`);
  const candidates = [-DAY_MS, 0, DAY_MS]
    .map((shift) => midnight - zoneOffsetMs(timeZone, midnight + shift))
    .filter((instant) => calendarDateIn(timeZone, new Date(instant)) === isoDate);
  return new Date(Math.min(...candidates));
}

/** The instants from the start of `fromDay` (included) to the start of the day after `toDay` (excluded). */
export function zoneDayRange(timeZone: string, fromDay: string, toDay: string = fromDay): { from: string; before: string } {
  return { from: startOfDayIn(timeZone, fromDay).toISOString(), before: startOfDayIn(timeZone, addDays(toDay, 1)).toISOString() };
}
