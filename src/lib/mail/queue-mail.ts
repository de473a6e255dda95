import 'server-only';
import { randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { OutboundMessage, database } from '@/lib/db';
import type { MailMessage } from './send-mail';

/**
 * Writes the e-mails a decision owes inside that decision's transaction: they commit with it or not at all.
 * Nothing is sent here; `deliverOutboundMail` sends them once the transaction has committed. Returns their ids.
 */
export async function queueMail({ purpose, messages }: { purpose: string; messages: Pick<MailMessage, 'to' | 'subject' | 'text'>[] }, transaction: Transaction): Promise<string[]> {
  database();
  const createdAt = new Date().toISOString();
  const ids: string[] = [];
  for (const message of messages) {
    const id = randomUUID();
    await OutboundMessage.create(
      { id, messageId: `<${id}@outbound.sillmark>`, purpose, recipient: message.to, subject: message.subject, bodyText: message.text, status: 'pending', attempts: 0, nextAttemptAt: Date.parse(createdAt), leaseUntil: null, claimToken: null, lastError: null, createdAt, deliveredAt: null },
      { transaction },
    );
    ids.push(id);
  }
  return ids;
}
