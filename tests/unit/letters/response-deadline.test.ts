import { describe, expect, it } from 'vitest';
import { addDays, calendarDateIn, daysBetween, deadlineStanding, responseDeadline } from '@/lib/dates/calendar-dates';

// Calendar facts (days per month, leap years, the UK's clock changes on the last Sundays of March and October)
// are common knowledge; the 2026 change dates, 29 March and 25 October, follow from that rule.

describe('the response deadline', () => {
  it('adds the template’s days on the calendar, across month and year ends and a leap day', () => {
    expect(addDays('2026-01-20', 28)).toBe('2026-02-17');
    expect(addDays('2026-12-10', 28)).toBe('2027-01-07');
    expect(addDays('2028-02-15', 28)).toBe('2028-03-14'); // 2028 is a leap year: 29 February counts
    expect(addDays('2027-02-15', 28)).toBe('2027-03-15');
    expect(daysBetween('2026-03-01', addDays('2026-03-01', 28))).toBe(28);
  });

  it('counts from the letter’s date in the portal’s time zone, not in UTC', () => {
    // 23:30 UTC on 30 June 2026 is already 1 July in London (BST, UTC+1).
    expect(calendarDateIn('Europe/London', '2026-06-30T23:30:00Z')).toBe('2026-07-01');
    expect(responseDeadline({ letterMadeAt: '2026-06-30T23:30:00Z', days: 28, timeZone: 'Europe/London' })).toBe('2026-07-29');
    expect(responseDeadline({ letterMadeAt: '2026-06-30T23:30:00Z', days: 28, timeZone: 'UTC' })).toBe('2026-07-28');
  });

  it('is not moved by the clocks going back within the period', () => {
    expect(responseDeadline({ letterMadeAt: '2026-10-10T09:00:00Z', days: 28, timeZone: 'Europe/London' })).toBe('2026-11-07');
    expect(responseDeadline({ letterMadeAt: '2026-03-20T09:00:00Z', days: 14, timeZone: 'Europe/London' })).toBe('2026-04-03');
  });

  it('refuses what is not an ISO date or a whole number of days', () => {
    expect(() => addDays('20/01/2026', 28)).toThrow(RangeError);
    expect(() => addDays('2026-01-20', 1.5)).toThrow(RangeError);
  });
});

describe('where a letter stands against its deadline', () => {
  it('is overdue the day after the deadline, due soon within seven days, answered once a response is logged', () => {
    expect(deadlineStanding({ dueOn: '2026-02-17', today: '2026-02-17', answered: false })).toBe('due-soon');
    expect(deadlineStanding({ dueOn: '2026-02-17', today: '2026-02-18', answered: false })).toBe('overdue');
    expect(deadlineStanding({ dueOn: '2026-02-17', today: '2026-02-10', answered: false })).toBe('due-soon');
    expect(deadlineStanding({ dueOn: '2026-02-17', today: '2026-02-09', answered: false })).toBe('open');
    expect(deadlineStanding({ dueOn: '2026-02-17', today: '2026-03-30', answered: true })).toBe('answered');
  });
});
