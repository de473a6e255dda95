import { z } from 'zod';
import './zod-without-eval';

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** True for a calendar date written YYYY-MM-DD that exists: 2026-02-28 is one, 2026-02-30 and 2026-13-45 are not. */
export function isRealIsoDate(text: string): boolean {
  const match = ISO_DATE.exec(text);
  if (!match) return false;
  const [year, month, day] = match.slice(1).map(Number);
  // Date.UTC rolls 30 February over into March, so a date that exists is one that comes back unchanged.
  const date = new Date(Date.UTC(year, month - 1, day));
  return date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day;
}

function dateProblem(text: string, what: string): string | null {
  if (!ISO_DATE.test(text)) return `must be a date like 2026-03-14 (${what})`;
  return isRealIsoDate(text) ? null : `is not a day in the calendar: ${text} does not exist (${what})`;
}

function dateText(what: string, allowEmpty: boolean) {
  return z
    .string({ error: (issue) => (issue.input === undefined || issue.input === null ? `is required (${what})` : `must be a date like 2026-03-14 (${what})`) })
    .trim()
    .check((ctx) => {
      const problem = allowEmpty && ctx.value === '' ? null : dateProblem(ctx.value, what);
      if (problem) ctx.issues.push({ code: 'custom', message: problem, input: ctx.value });
    });
}

/** A date typed or sent as YYYY-MM-DD, refused unless the day exists in the calendar. */
export function isoDateText(what: string) {
  return dateText(what, false);
}

/** The same, or empty for "no date": a search filter left blank. */
export function optionalIsoDateText(what: string) {
  return dateText(what, true);
}
