import 'server-only';
import { randomUUID } from 'node:crypto';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { portalTimeZone } from '@/lib/config/portal-time-zone';
import { LetterReminder, LetterResponse, Parcel, database } from '@/lib/db';
import { calendarDateIn } from '@/lib/dates/calendar-dates';
import { ConflictError } from '@/lib/http/app-errors';
import { LETTER_REMINDER_PURPOSE, deliverOutboundMail } from '@/lib/mail/deliver-outbound-mail';
import { queueMail } from '@/lib/mail/queue-mail';
import { requireLetterAccess } from './load-letter';
import { reminderDocument, reminderEmailText } from './reminder-content';
import type { LetterDocument } from './render-letter-pdf';

/**
 * Makes a reminder for a letter that went out and has no response: an e-mail through the outbox (committed with the
 * reminder) when the letter went by e-mail, otherwise a reminder letter to print and post. The letter's response
 * deadline moves to the reminder's.
 */
export async function makeReminder({ user, letterId }: { user: SessionUser; letterId: string }) {
  const made = await database().transaction(async (transaction) => {
    const { letter, scheme } = await requireLetterAccess({ user, letterId, manage: true, transaction });
    if (letter.status !== 'sent' && letter.status !== 'posted') throw new ConflictError(letter.status === 'acknowledged' ? 'The landowner has responded to this letter, so it needs no reminder.' : 'Only a letter that was sent or posted can be followed up with a reminder.');
    if ((await LetterResponse.count({ where: { letterId }, transaction })) > 0) throw new ConflictError('The landowner has responded to this letter, so it needs no reminder.');
    if (!letter.documentJson) throw new ConflictError('This letter was made before reminders existed; make a new version of it instead.');
    const reminderDate = calendarDateIn(portalTimeZone(), new Date());
    const document = reminderDocument(JSON.parse(letter.documentJson) as LetterDocument, reminderDate);
    const channel = letter.status === 'sent' && letter.recipientEmail ? 'email' : 'post';
    const parcel = await Parcel.findByPk(letter.parcelId, { transaction });
    const mail = channel === 'email' ? await queueMail({ purpose: LETTER_REMINDER_PURPOSE, messages: [{ to: letter.recipientEmail as string, subject: `Reminder: ${scheme.name}: your land at ${document.impact.parcel.reference}`, text: reminderEmailText({ ownerName: parcel?.ownerName ?? 'landowner', letter: document, organisation: document.organisation }) }] }, transaction) : [];
    const reminder = await LetterReminder.create({ id: randomUUID(), letterId, channel, outboundMessageId: mail[0] ?? null, createdBy: user.id, postedOn: null }, { transaction });
    const previousDue = letter.responseDueOn;
    await letter.update({ responseDueOn: document.respondBy }, { transaction });
    await recordAuditEvent({ actorId: user.id, action: 'letter.reminder-made', entityType: 'letter', entityId: letterId, schemeId: scheme.id, details: { reminderId: reminder.id, channel, previousDue, respondBy: document.respondBy } }, transaction);
    return { reminderId: reminder.id, channel, respondBy: document.respondBy, mail };
  });
  if (made.mail.length) await deliverOutboundMail({ ids: made.mail });
  return { reminderId: made.reminderId, channel: made.channel, respondBy: made.respondBy };
}
