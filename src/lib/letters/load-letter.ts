import 'server-only';
import type { Transaction } from 'sequelize';
import type { SessionUser } from '@/lib/auth/current-session';
import { revisionRevocation } from '@/lib/certificates/revision-revocation';
import { portalTimeZone } from '@/lib/config/portal-time-zone';
import { Letter, LetterReminder, LetterResponse, LetterResponseEdit, Parcel, Revision, User, database } from '@/lib/db';
import { calendarDateIn, deadlineStanding } from '@/lib/dates/calendar-dates';
import type { LetterStatus } from '@/lib/db/models/letter';
import { NotFoundError } from '@/lib/http/app-errors';
import { requireSchemeLiaisonAccess } from '@/lib/parcels/scheme-liaison-access';
import type { LetterImpact } from './letter-impact';

/** A letter and its scheme, once the user's access to that scheme's owner details is checked; unknown or hidden is 404. */
export async function requireLetterAccess({ user, letterId, manage = false, transaction }: { user: SessionUser; letterId: string; manage?: boolean; transaction?: Transaction }) {
  database();
  const letter = await Letter.findByPk(letterId, { transaction });
  const revision = letter ? await Revision.findByPk(letter.revisionId, { transaction }) : null;
  if (!letter || !revision) throw new NotFoundError('No such letter.');
  const { scheme, access } = await requireSchemeLiaisonAccess({ user, schemeId: revision.schemeId, manage, transaction });
  return { letter, revision, scheme, access };
}

/** Everything the letter's page shows: to whom and when it went, its numbers, and the responses logged. */
export async function loadLetterDetail({ user, letterId }: { user: SessionUser; letterId: string }) {
  const { letter, revision, scheme, access } = await requireLetterAccess({ user, letterId });
  const parcel = await Parcel.findByPk(letter.parcelId);
  const responses = await LetterResponse.findAll({ where: { letterId }, order: [['receivedAt', 'DESC'], ['createdAt', 'DESC']] });
  const edits = await LetterResponseEdit.findAll({ where: { responseId: responses.map((r) => r.id) }, order: [['createdAt', 'DESC']] });
  const reminders = await LetterReminder.findAll({ where: { letterId }, order: [['createdAt', 'DESC']] });
  const people = new Map((await User.findAll({ where: { id: [...responses.map((r) => r.loggedBy), ...edits.map((e) => e.editedBy), ...reminders.map((r) => r.createdBy)] } })).map((u) => [u.id, u.name]));
  const today = calendarDateIn(portalTimeZone(), new Date());
  const out = letter.status === 'sent' || letter.status === 'posted' || letter.status === 'acknowledged';
  return {
    access,
    scheme: { id: scheme.id, reference: scheme.reference, name: scheme.name },
    revision: { id: revision.id, number: revision.number, status: revision.status, revoked: (await revisionRevocation(revision)) !== null },
    letter: { id: letter.id, version: letter.version, preliminary: letter.preliminary, category: letter.category, status: letter.status as LetterStatus, recipientEmail: letter.recipientEmail, failureReason: letter.failureReason, messageId: letter.messageId, sentAt: letter.sentAt, acknowledgedAt: letter.acknowledgedAt, createdAt: letter.createdAt, pdfSha256: letter.pdfSha256, responseDueOn: letter.responseDueOn ?? null, postedOn: letter.postedOn ?? null, canRemind: (letter.status === 'sent' || letter.status === 'posted') && responses.length === 0 && !!letter.documentJson },
    standing: out && letter.responseDueOn ? deadlineStanding({ dueOn: letter.responseDueOn, today, answered: responses.length > 0 }) : null,
    reminders: reminders.map((r) => ({ id: r.id, channel: r.channel, createdAt: r.createdAt, madeBy: people.get(r.createdBy) ?? 'unknown user' })),
    parcel: parcel ? { reference: parcel.reference, ownerName: parcel.ownerName, postalAddress: parcel.postalAddress } : null,
    impact: JSON.parse(letter.impactJson) as LetterImpact,
    responses: responses.map((r) => ({
      id: r.id,
      receivedAt: r.receivedAt,
      summary: r.summary,
      responseType: r.responseType,
      channel: r.channel,
      loggedBy: people.get(r.loggedBy) ?? 'unknown user',
      createdAt: r.createdAt,
      earlier: edits.filter((e) => e.responseId === r.id).map((e) => ({ editedAt: e.createdAt, editedBy: people.get(e.editedBy) ?? 'unknown user', ...(JSON.parse(e.previousJson) as { receivedAt: string; summary: string; responseType: string; channel: string }) })),
    })),
  };
}
export type LetterDetail = Awaited<ReturnType<typeof loadLetterDetail>>;
