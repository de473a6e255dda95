import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { portalTimeZone } from '@/lib/config/portal-time-zone';
import { LetterReminder, database } from '@/lib/db';
import { calendarDateIn } from '@/lib/dates/calendar-dates';
import { NotFoundError } from '@/lib/http/app-errors';
import { letterPdfOffThread } from '@/lib/pdf-pool/render-off-thread';
import { requireLetterAccess } from './load-letter';
import { reminderDocument } from './reminder-content';
import type { LetterDocument } from './render-letter-pdf';

/** A reminder letter to print and post: the letter re-dated on the day the reminder was made (the same every time). */
export async function reminderPdf({ user, reminderId }: { user: SessionUser; reminderId: string }) {
  database();
  const reminder = await LetterReminder.findByPk(reminderId);
  if (!reminder) throw new NotFoundError('No such reminder.');
  const { letter, scheme } = await requireLetterAccess({ user, letterId: reminder.letterId, manage: true });
  if (!letter.documentJson) throw new NotFoundError('This reminder has no letter to print.');
  const first = JSON.parse(letter.documentJson) as LetterDocument;
  const document = { ...reminderDocument(first, calendarDateIn(portalTimeZone(), reminder.createdAt)), date: reminder.createdAt };
  const pdf = await letterPdfOffThread(document);
  return { pdf, fileName: `${scheme.reference}-reminder-${first.impact.parcel.reference}.pdf`.replace(/[^A-Za-z0-9._-]/g, '-') };
}
