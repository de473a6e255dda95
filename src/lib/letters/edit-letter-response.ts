import 'server-only';
import { randomUUID } from 'node:crypto';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { LetterResponse, LetterResponseEdit, database } from '@/lib/db';
import { NotFoundError } from '@/lib/http/app-errors';
import type { EditResponseInput } from '@/lib/validation/letter-schemas';
import { requireLetterAccess } from './load-letter';
import { refuseBeforeSent } from './log-letter-response';

/** Corrects a logged response; its earlier wording, date, type and channel are kept as an edit, never overwritten unseen. */
export async function editLetterResponse({ user, input }: { user: SessionUser; input: EditResponseInput }) {
  return database().transaction(async (transaction) => {
    const response = await LetterResponse.findByPk(input.responseId, { transaction });
    if (!response) throw new NotFoundError('No such response.');
    const { letter, scheme } = await requireLetterAccess({ user, letterId: response.letterId, manage: true, transaction });
    refuseBeforeSent(letter, input.receivedOn);
    const previous = { receivedAt: response.receivedAt, summary: response.summary, responseType: response.responseType, channel: response.channel, loggedBy: response.loggedBy };
    await LetterResponseEdit.create({ id: randomUUID(), responseId: response.id, editedBy: user.id, previousJson: JSON.stringify(previous) }, { transaction });
    await response.update({ receivedAt: `${input.receivedOn}T00:00:00.000Z`, summary: input.summary, responseType: input.responseType, channel: input.channel }, { transaction });
    await recordAuditEvent({ actorId: user.id, action: 'letter.response-edited', entityType: 'letter', entityId: letter.id, schemeId: scheme.id, details: { responseId: response.id, receivedOn: input.receivedOn, type: input.responseType, channel: input.channel } }, transaction);
    return { responseId: response.id, letterId: letter.id };
  });
}
