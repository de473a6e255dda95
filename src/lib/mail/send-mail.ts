import 'server-only';
import { randomUUID } from 'node:crypto';
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import nodemailer from 'nodemailer';
import { OutboxMessage, database } from '@/lib/db';
import { dataDirectory } from '@/lib/db/database-path';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

export const MAIL_FROM = process.env.MAIL_FROM ?? 'Sillmark <no-reply@sillmark.invalid>';

/**
 * Sends through SMTP_URL when it is set; otherwise the message is written to the local outbox
 * (data directory + a row an admin can read), so nothing leaves the machine in development and demos.
 */
export async function sendMail(message: MailMessage): Promise<{ messageId: string }> {
  if (process.env.SMTP_URL) {
    const info = await nodemailer.createTransport(process.env.SMTP_URL).sendMail({ from: MAIL_FROM, ...message });
    return { messageId: info.messageId };
  }
  const info = await nodemailer.createTransport({ streamTransport: true, buffer: true, newline: 'unix' }).sendMail({ from: MAIL_FROM, ...message });
  const raw = info.message as Buffer;
  const id = randomUUID();
  const folder = dataDirectory('outbox');
  await mkdir(folder, { recursive: true });
  const rawPath = path.join(folder, `${id}.eml`);
  await writeFile(rawPath, raw);
  database();
  await OutboxMessage.create({ id, messageId: info.messageId, envelopeFrom: MAIL_FROM, envelopeTo: message.to, subject: message.subject, rawPath, sizeBytes: raw.length, receivedAt: new Date().toISOString() });
  return { messageId: info.messageId };
}
