import 'server-only';
import { randomUUID } from 'node:crypto';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { LetterResponse, database } from '@/lib/db';
import { ConflictError, InvalidRequestError } from '@/lib/http/app-errors';
import type { LogResponseInput } from '@/lib/validation/letter-schemas';
import { requireLetterAccess } from './load-letter';

/** Records what a landowner replied; the letter becomes "acknowledged". A letter not yet sent has nothing to answer. */
export async function logLetterResponse({ user, input }: { user: SessionUser; input: LogResponseInput }) {
  const sequelize = database();
  return sequelize.transaction(async (transaction) => {
    const { letter, scheme } = await requireLetterAccess({ user, letterId: input.letterId, manage: true, transaction });
    if (letter.status === 'queued' || letter.status === 'sending') throw new ConflictError('This letter has not been sent yet, so there is no response to log.');
    const sentOn = letter.sentAt?.slice(0, 10);
    if (sentOn && input.receivedOn < sentOn) throw new InvalidRequestError([{ path: 'receivedOn', message: `must be on or after ${sentOn}, the day the letter was sent` }]);
    const response = await LetterResponse.create({ id: randomUUID(), letterId: letter.id, loggedBy: user.id, receivedAt: `${input.receivedOn}T00:00:00.000Z`, summary: input.summary }, { transaction });
    await letter.update({ status: 'acknowledged', acknowledgedAt: letter.acknowledgedAt ?? new Date().toISOString() }, { transaction });
    await recordAuditEvent({ actorId: user.id, action: 'letter.response-logged', entityType: 'letter', entityId: letter.id, schemeId: scheme.id, details: { responseId: response.id, receivedOn: input.receivedOn } }, transaction);
    return { responseId: response.id, letterId: letter.id };
  });
}
