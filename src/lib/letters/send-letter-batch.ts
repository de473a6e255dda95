import 'server-only';
import { Op } from 'sequelize';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { Letter, LetterBatch, Parcel, Scheme, database } from '@/lib/db';
import { type MailMessage, openMailRun } from '@/lib/mail/send-mail';
import { organisationSender } from '@/lib/config/organisation';
import { requireSchemeLiaisonAccess } from '@/lib/parcels/scheme-liaison-access';
import type { SendBatchInput } from '@/lib/validation/letter-schemas';
import { batchProgress, loadBatch } from './batch-progress';
import { withBatchLock } from './batch-lock';
import { claimLetter, deliveredAt, letterMessageId, recordOutcome } from './letter-delivery';
import { emailText } from './letter-content';
import type { LetterImpact } from './letter-impact';
import { readLetterPdf } from './letter-files';

export type Deliver = (message: MailMessage) => Promise<{ messageId: string }>;

interface Run {
  user: SessionUser;
  schemeId: string;
}

/** Letters left "sending" by an interrupted run: sent if the server has them, otherwise queued again (local) or failed (provider). */
async function settleInterrupted(batchId: string, run: Run): Promise<void> {
  for (const letter of await Letter.findAll({ where: { batchId, status: 'sending' } })) {
    const at = await deliveredAt(letter.id);
    const outcome =
      at === 'unknown'
        ? { status: 'failed' as const, reason: 'Sending was interrupted before the mail server confirmed it. Check with the recipient before sending it again.' }
        : at
          ? { status: 'sent' as const, sentAt: at, recovered: true }
          : { status: 'queued' as const };
    await recordOutcome({ letterId: letter.id, actorId: run.user.id, schemeId: run.schemeId, outcome });
  }
}

async function requeueFailed(batchId: string, run: Run): Promise<void> {
  const sequelize = database();
  await sequelize.transaction(async (transaction) => {
    const [count] = await Letter.update({ status: 'queued', failureReason: null }, { where: { batchId, status: 'failed', recipientEmail: { [Op.ne]: null } }, transaction });
    if (count > 0) await recordAuditEvent({ actorId: run.user.id, action: 'letters.retry', entityType: 'letter_batch', entityId: batchId, schemeId: run.schemeId, details: { letters: count } }, transaction);
  });
}

async function message(letter: Letter, run: Run, replyTo: string): Promise<MailMessage> {
  const parcel = await Parcel.findByPk(letter.parcelId);
  const scheme = await Scheme.findByPk(run.schemeId);
  const impact = JSON.parse(letter.impactJson) as LetterImpact;
  const subject = `${letter.preliminary ? 'PRELIMINARY: ' : ''}${scheme?.name ?? 'Scheme'}: your land at ${impact.parcel.reference}`;
  const safeReference = impact.parcel.reference.replace(/[^A-Za-z0-9_-]+/g, '-');
  const organisation = letter.documentJson ? (JSON.parse(letter.documentJson) as { organisation?: string }).organisation : undefined;
  return {
    from: organisationSender(organisation),
    to: letter.recipientEmail as string,
    subject,
    text: emailText({ ownerName: parcel?.ownerName ?? 'landowner', subject, impact, preliminary: letter.preliminary, organisation: organisationSender(organisation).name }),
    attachments: [{ filename: `letter-${safeReference}-v${letter.version}.pdf`, content: await readLetterPdf(letter.pdfPath as string), contentType: 'application/pdf' }],
    messageId: letterMessageId(letter.id),
    replyTo,
  };
}

async function sendOne(letter: Letter, run: Run, deliver: Deliver): Promise<void> {
  if (!(await claimLetter(letter.id))) return;
  if (!letter.recipientEmail) {
    await recordOutcome({ letterId: letter.id, actorId: run.user.id, schemeId: run.schemeId, outcome: { status: 'failed', reason: 'No e-mail address in the parcels register: print the PDF and post it.' } });
    return;
  }
  let mail: MailMessage;
  try {
    mail = await message(letter, run, run.user.email);
  } catch (error) {
    await recordOutcome({ letterId: letter.id, actorId: run.user.id, schemeId: run.schemeId, outcome: { status: 'failed', reason: `The letter could not be prepared for sending: ${(error as Error).message}` } });
    return;
  }
  try {
    await deliver(mail);
  } catch (error) {
    // A send that failed after the server took the message (a lost reply) must not be offered for sending again.
    const at = await deliveredAt(letter.id);
    const outcome = typeof at === 'string' && at !== 'unknown' ? { status: 'sent' as const, sentAt: at, recovered: true } : { status: 'failed' as const, reason: `The mail server refused or did not confirm it: ${(error as Error).message}` };
    await recordOutcome({ letterId: letter.id, actorId: run.user.id, schemeId: run.schemeId, outcome });
    return;
  }
  await recordOutcome({ letterId: letter.id, actorId: run.user.id, schemeId: run.schemeId, outcome: { status: 'sent', sentAt: new Date().toISOString() } });
}

/**
 * Sends up to `max` queued letters of a batch as e-mails with the PDF attached, then reports the progress. Call it
 * again to go on: it resumes where any earlier run stopped and never sends a letter twice (each letter is claimed
 * queued → sending in a transaction, and an interrupted claim is settled against the outbox before anything else).
 */
export async function sendLetterBatch({ user, batchId, input, deliver }: { user: SessionUser; batchId: string; input: SendBatchInput; deliver?: Deliver }) {
  const batch = await loadBatch(batchId);
  await requireSchemeLiaisonAccess({ user, schemeId: batch.schemeId, manage: true });
  const run: Run = { user, schemeId: batch.schemeId };
  await withBatchLock(batchId, async () => {
    await settleInterrupted(batchId, run);
    if (input.retryFailed) await requeueFailed(batchId, run);
    const queued = await Letter.findAll({ where: { batchId, status: 'queued' }, order: [['createdAt', 'ASC'], ['id', 'ASC']], limit: input.max });
    if (queued.length) await LetterBatch.update({ status: 'sending' }, { where: { id: batchId } });
    const mail = deliver ? null : await openMailRun();
    try {
      for (const letter of queued) await sendOne(letter, run, deliver ?? mail!.send);
    } finally {
      mail?.close();
    }
    const pending = await Letter.count({ where: { batchId, status: ['queued', 'sending'] } });
    if (pending === 0) await LetterBatch.update({ status: 'complete' }, { where: { id: batchId } });
  });
  return batchProgress({ user, batchId });
}
