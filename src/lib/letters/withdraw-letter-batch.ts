import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { Letter, LetterBatch, database } from '@/lib/db';
import { ConflictError, NotFoundError } from '@/lib/http/app-errors';
import { requireSchemeLiaisonAccess } from '@/lib/parcels/scheme-liaison-access';
import { withBatchLock } from './batch-lock';
import { GONE_OUT } from './letter-statuses';

/**
 * Withdraws a batch made by mistake, before any of its letters has gone out (by e-mail or by post): its letters are
 * kept, marked withdrawn, and are never sent; new letters can then be made. A batch with a letter already out is refused.
 */
export async function withdrawLetterBatch({ user, batchId }: { user: SessionUser; batchId: string }) {
  return withBatchLock(batchId, () =>
    database().transaction(async (transaction) => {
      const batch = await LetterBatch.findByPk(batchId, { transaction });
      if (!batch) throw new NotFoundError('No such batch of letters.');
      await requireSchemeLiaisonAccess({ user, schemeId: batch.schemeId, manage: true, transaction });
      if (batch.status === 'withdrawn') throw new ConflictError('This batch was withdrawn already.');
      const out = await Letter.count({ where: { batchId, status: [...GONE_OUT] }, transaction });
      if (out > 0) throw new ConflictError(`${out} letter(s) of this batch have already gone out, so it can no longer be withdrawn. Log what the landowners say, or make a new version of their letters.`);
      const [withdrawn] = await Letter.update({ status: 'withdrawn', failureReason: null }, { where: { batchId }, transaction });
      await batch.update({ status: 'withdrawn' }, { transaction });
      await recordAuditEvent({ actorId: user.id, action: 'letters.batch-withdrawn', entityType: 'letter_batch', entityId: batchId, schemeId: batch.schemeId, details: { letters: withdrawn } }, transaction);
      return { batchId, withdrawn };
    }),
  );
}
