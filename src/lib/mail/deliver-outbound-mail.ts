import 'server-only';
import { OutboundMessage, database } from '@/lib/db';
import { claimOutboundMail } from './claim-outbound-mail';
import { MAX_ATTEMPTS, isPermanentRefusal, retryDelayMs } from './retry-schedule';
import { organisationSender } from '@/lib/config/organisation';
import { type MailMessage, sendMail } from './send-mail';

/** Reminders to landowners go out in the organisation's name, as their letters did. */
export const LETTER_REMINDER_PURPOSE = 'letter-reminder';

export interface DeliveryReport {
  delivered: number;
  retrying: number;
  failed: number;
}

type Send = (message: MailMessage) => Promise<{ messageId: string }>;

// A body is kept only while it may still be sent: an invitation's carries a one-time sign-up link.
async function recordOutcome(message: OutboundMessage, token: string, error: unknown | null, now: number): Promise<keyof DeliveryReport> {
  const sequelize = database();
  const where = { id: message.id, claimToken: token, status: 'sending' as const };
  if (error === null) {
    await sequelize.transaction((transaction) => OutboundMessage.update({ status: 'delivered', deliveredAt: new Date(now).toISOString(), leaseUntil: null, lastError: null, bodyText: '' }, { where, transaction }));
    return 'delivered';
  }
  const reason = error instanceof Error ? error.message : String(error);
  const final = isPermanentRefusal(error) || message.attempts >= MAX_ATTEMPTS;
  await sequelize.transaction((transaction) =>
    OutboundMessage.update(final ? { status: 'failed', leaseUntil: null, lastError: reason, bodyText: '' } : { status: 'pending', leaseUntil: null, lastError: reason, nextAttemptAt: now + retryDelayMs(message.attempts) }, { where, transaction }),
  );
  console.error(`E-mail "${message.subject}" to ${message.recipient}: attempt ${message.attempts} failed (${reason}); ${final ? 'given up' : 'will be retried'}.`);
  return final ? 'failed' : 'retrying';
}

/**
 * Sends the e-mails that are due, each under the Message-ID it was queued with, and records each outcome: delivered,
 * pending again with a later attempt (backoff), or failed for good after a final SMTP refusal or MAX_ATTEMPTS tries.
 * Called after a decision commits (with its ids), at start-up and periodically. A crash between the server's
 * acceptance and the "delivered" record sends the message again once its lease is over, under the same Message-ID.
 */
export async function deliverOutboundMail({ ids, limit = 50, now = Date.now, send = sendMail }: { ids?: string[]; limit?: number; now?: () => number; send?: Send } = {}): Promise<DeliveryReport> {
  const report: DeliveryReport = { delivered: 0, retrying: 0, failed: 0 };
  const { token, messages } = await claimOutboundMail({ now: now(), limit, ids });
  for (const message of messages) {
    let error: unknown | null = null;
    try {
      await send({ to: message.recipient, subject: message.subject, text: message.bodyText, messageId: message.messageId, ...(message.purpose === LETTER_REMINDER_PURPOSE ? { from: organisationSender() } : {}) });
    } catch (caught) {
      error = caught ?? new Error('The mail server gave no reason.');
    }
    report[await recordOutcome(message, token, error, now())] += 1;
  }
  return report;
}
