import 'server-only';
import type { Transaction } from 'sequelize';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import { heldReason } from '@/lib/certificates/held-reason';
import { Certificate, Letter, OutboxMessage, database } from '@/lib/db';

/** Our own Message-ID for a letter, so its message can be found again after an interrupted send. */
export function letterMessageId(letterId: string): string {
  return `<letter-${letterId}@sillmark.local>`;
}

/**
 * Whether the letter's message reached the mail server. The local outbox stores a message before it answers
 * "accepted", so there the answer is certain; a real provider (SMTP_URL) cannot be asked, so the answer is "unknown".
 */
export async function deliveredAt(letterId: string): Promise<string | null | 'unknown'> {
  if (process.env.SMTP_URL) return 'unknown';
  database();
  const message = await OutboxMessage.findOne({ where: { messageId: letterMessageId(letterId) } });
  return message ? message.receivedAt : null;
}

type Outcome = { status: 'sent'; sentAt: string; recovered?: boolean } | { status: 'failed'; reason: string } | { status: 'queued' };

/** Moves a letter that is "sending" to its outcome, with the audit event, in one transaction; a letter in any other state is left alone. */
export async function recordOutcome({ letterId, actorId, schemeId, outcome }: { letterId: string; actorId: string; schemeId: string; outcome: Outcome }): Promise<boolean> {
  const sequelize = database();
  return sequelize.transaction(async (transaction: Transaction) => {
    const values =
      outcome.status === 'sent'
        ? { status: 'sent' as const, sentAt: outcome.sentAt, messageId: letterMessageId(letterId), failureReason: null }
        : outcome.status === 'failed'
          ? { status: 'failed' as const, failureReason: outcome.reason.slice(0, 500) }
          : { status: 'queued' as const };
    const [changed] = await Letter.update(values, { where: { id: letterId, status: 'sending' }, transaction });
    if (changed === 0) return false;
    const action = outcome.status === 'sent' ? 'letter.sent' : outcome.status === 'failed' ? 'letter.send-failed' : 'letter.requeued';
    const details = outcome.status === 'failed' ? { reason: outcome.reason.slice(0, 500) } : outcome.status === 'sent' ? { recovered: !!outcome.recovered } : {};
    await recordAuditEvent({ actorId, action, entityType: 'letter', entityId: letterId, schemeId, details }, transaction);
    return true;
  });
}

/**
 * Claims a queued letter for sending; false when another run claimed it first, or when its revision's certificate
 * was revoked after the letter was queued (it is then held, in the same transaction, so it is never sent).
 */
export async function claimLetter(letterId: string): Promise<boolean> {
  const sequelize = database();
  return sequelize.transaction(async (transaction) => {
    const letter = await Letter.findOne({ where: { id: letterId, status: 'queued' }, transaction });
    if (!letter) return false;
    const revoked = await Certificate.findOne({ where: { revisionId: letter.revisionId, status: 'revoked' }, transaction });
    if (revoked) {
      await Letter.update({ status: 'held', failureReason: heldReason(revoked.number) }, { where: { id: letterId, status: 'queued' }, transaction });
      return false;
    }
    return (await Letter.update({ status: 'sending' }, { where: { id: letterId, status: 'queued' }, transaction }))[0] === 1;
  });
}
