import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { LetterBatch, database } from '@/lib/db';
import { ConflictError } from '@/lib/http/app-errors';
import { requireLetterAccess } from './load-letter';

/**
 * Puts one failed letter back in its batch's queue, so the next send of the batch tries it again. A letter whose
 * send may have reached the mail server says so in its reason; the officer decides after checking with the recipient.
 */
export async function resendLetter({ user, letterId }: { user: SessionUser; letterId: string }) {
  return database().transaction(async (transaction) => {
    const { letter, scheme } = await requireLetterAccess({ user, letterId, manage: true, transaction });
    if (letter.status !== 'failed') throw new ConflictError('Only a letter that failed to send can be sent again.');
    if (!letter.recipientEmail) throw new ConflictError('This letter has no e-mail address to send it to: print it and post it.');
    await letter.update({ status: 'queued', failureReason: null }, { transaction });
    if (letter.batchId) await LetterBatch.update({ status: 'sending' }, { where: { id: letter.batchId, status: 'complete' }, transaction });
    await recordAuditEvent({ actorId: user.id, action: 'letter.resend', entityType: 'letter', entityId: letter.id, schemeId: scheme.id, details: {} }, transaction);
    return { letterId: letter.id, batchId: letter.batchId };
  });
}
