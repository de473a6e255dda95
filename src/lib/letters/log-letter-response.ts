import 'server-only';
import { randomUUID } from 'node:crypto';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { type Letter, LetterResponse, database } from '@/lib/db';
import { portalDate } from '@/lib/dates/portal-time';
import { ConflictError, InvalidRequestError } from '@/lib/http/app-errors';
import type { LogResponseInput } from '@/lib/validation/letter-schemas';
import { ANSWERABLE } from './letter-statuses';
import { requireLetterAccess } from './load-letter';

/** A response cannot arrive before its letter went out (the day it was e-mailed or posted). */
export function refuseBeforeSent(letter: Letter, receivedOn: string): void {
  // The day in the portal's zone; a posted letter keeps the day it was posted as given.
  const sentOn = letter.postedOn ?? (letter.sentAt ? portalDate(letter.sentAt) : undefined);
  if (sentOn && receivedOn < sentOn) throw new InvalidRequestError([{ path: 'receivedOn', message: `must be on or after ${sentOn}, the day the letter was ${letter.status === 'posted' ? 'posted' : 'sent'}` }]);
}

/** Records what a landowner replied, how and of what kind; the letter becomes "acknowledged". A letter not yet out has nothing to answer. */
export async function logLetterResponse({ user, input }: { user: SessionUser; input: LogResponseInput }) {
  const sequelize = database();
  return sequelize.transaction(async (transaction) => {
    const { letter, scheme } = await requireLetterAccess({ user, letterId: input.letterId, manage: true, transaction });
    if (!ANSWERABLE.includes(letter.status)) throw new ConflictError(letter.status === 'withdrawn' ? 'This letter was withdrawn and never sent, so there is no response to log.' : 'This letter has not been sent or posted yet, so there is no response to log.');
    refuseBeforeSent(letter, input.receivedOn);
    const response = await LetterResponse.create({ id: randomUUID(), letterId: letter.id, loggedBy: user.id, receivedAt: `${input.receivedOn}T00:00:00.000Z`, summary: input.summary, responseType: input.responseType, channel: input.channel }, { transaction });
    await letter.update({ status: 'acknowledged', acknowledgedAt: letter.acknowledgedAt ?? new Date().toISOString() }, { transaction });
    await recordAuditEvent({ actorId: user.id, action: 'letter.response-logged', entityType: 'letter', entityId: letter.id, schemeId: scheme.id, details: { responseId: response.id, receivedOn: input.receivedOn, type: input.responseType, channel: input.channel } }, transaction);
    return { responseId: response.id, letterId: letter.id };
  });
}
