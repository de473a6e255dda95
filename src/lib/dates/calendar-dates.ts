// Calendar arithmetic for deadlines and the dates shown on screen. Pure: the time zone is always passed in.

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** The calendar date (YYYY-MM-DD) that an instant falls on in a time zone. */
export function calendarDateIn(timeZone: string, instant: Date | string): string {
  // en-CA formats a date as YYYY-MM-DD.
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(new Date(instant));
}

/** A calendar date plus whole days; counted on the calendar, so a change of clocks never moves it. */
export function addDays(isoDate: string, days: number): string {
  const m = ISO_DATE.exec(isoDate);
  if (!m || !Number.isInteger(days)) throw new RangeError(`not an ISO date and a whole number of days: ${isoDate}, ${days}`);
  const d = new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]) + days));
  return d.toISOString().slice(0, 10);
}

/** Whole days from one calendar date to another (negative when `to` is earlier). */
export function daysBetween(from: string, to: string): number {
  return Math.round((Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / 86_400_000);
}

/** The day the landowner is asked to respond by: the letter's date in the portal's zone, plus the template's days. */
export function responseDeadline({ letterMadeAt, days, timeZone }: { letterMadeAt: string; days: number; timeZone: string }): string {
  return addDays(calendarDateIn(timeZone, letterMadeAt), days);
}

export type DeadlineStanding = 'answered' | 'overdue' | 'due-soon' | 'open';

/** Where a letter stands against its deadline on `today`: overdue after the day, due soon within `soonDays` of it. */
export function deadlineStanding({ dueOn, today, answered, soonDays = 7 }: { dueOn: string; today: string; answered: boolean; soonDays?: number }): DeadlineStanding {
  if (answered) return 'answered';
  const left = daysBetween(today, dueOn);
  if (left < 0) return 'overdue';
  return left <= soonDays ? 'due-soon' : 'open';
}

/** A date for people: "3 December 2026". */
export function longDate(isoDate: string): string {
  return new Date(`${isoDate}T12:00:00Z`).toLocaleDateString('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });
}

/** A moment for people, in the portal's zone: "3 Dec 2026, 14:05 GMT" (with seconds, "14:05:09 GMT"). */
export function localDateTime(timeZone: string, instant: string, { seconds = false }: { seconds?: boolean } = {}): string {
  return new Intl.DateTimeFormat('en-GB', { timeZone, day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', ...(seconds ? { second: '2-digit' } : {}), timeZoneName: 'short' }).format(new Date(instant));
}
