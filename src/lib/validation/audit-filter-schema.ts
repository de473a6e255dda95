import { z } from 'zod';
import { AUDIT_ACTION_CODES } from '@/lib/audit/audit-actions';

// The audit trail's filters, from the page's query or the CSV export's: one schema, two users.

// Date.parse rolls 2026-02-30 over into March and rejects month 13: a real day reads back as itself.
const isCalendarDay = (v: string) => {
  const time = Date.parse(`${v}T00:00:00Z`);
  return Number.isFinite(time) && new Date(time).toISOString().slice(0, 10) === v;
};

const calendarDate = (label: string) =>
  z
    .string()
    .trim()
    .regex(/^(\d{4}-\d{2}-\d{2})?$/, `Give the ${label} date as YYYY-MM-DD.`)
    .refine((v) => v === '' || isCalendarDay(v), { message: `The ${label} date is not a day of the calendar.` })
    .default('');

const recordId = (what: string) => z.string().trim().max(64, `Choose the ${what} from the list.`).default('');

export const auditFilterSchema = z
  .object({
    person: recordId('person'),
    action: z.enum(['', ...AUDIT_ACTION_CODES], { message: 'Choose a kind of event from the list.' }).default(''),
    scheme: recordId('scheme'),
    from: calendarDate('“from”'),
    to: calendarDate('“to”'),
    q: z.string().trim().max(200, 'Search for at most 200 characters.').default(''),
    before: z
      .string()
      .trim()
      .regex(/^([1-9]\d{0,14})?$/, 'The page of older events must start from an event number (a whole number from 1).')
      .default('')
      .transform((v) => (v === '' ? null : Number(v))),
  })
  .refine((v) => !v.from || !v.to || v.from <= v.to, { path: ['to'], message: 'The “to” date must be on or after the “from” date.' });

export type AuditFilter = z.infer<typeof auditFilterSchema>;
export type AuditFilterInput = z.input<typeof auditFilterSchema>;
