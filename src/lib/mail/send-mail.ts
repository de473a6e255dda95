import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';
import { LOCAL_SMTP_HOST, ensureLocalSmtpServer } from './local-smtp-server';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
  /** A Message-ID of our own (`<…@…>`), so a message can be found again in the outbox or at the provider. */
  messageId?: string;
  replyTo?: string;
}

export const MAIL_FROM = process.env.MAIL_FROM ?? 'Sillmark <no-reply@sillmark.invalid>';

const cache = globalThis as unknown as { sillmarkMailTransport?: { key: string; transport: Transporter } };

async function localPort(): Promise<number> {
  try {
    return (await ensureLocalSmtpServer()).port;
  } catch (error) {
    // SMTP_PORT is taken by another process: that is the app's own local server (e.g. a CLI run beside `npm start`).
    if ((error as NodeJS.ErrnoException).code === 'EADDRINUSE' && process.env.SMTP_PORT) return Number(process.env.SMTP_PORT);
    throw error;
  }
}

async function transport(): Promise<Transporter> {
  const url = process.env.SMTP_URL;
  const key = url ?? `local:${await localPort()}`;
  if (cache.sillmarkMailTransport?.key !== key) {
    const created = url ? nodemailer.createTransport(url) : nodemailer.createTransport({ host: LOCAL_SMTP_HOST, port: Number(key.slice(6)), secure: false, ignoreTLS: true });
    cache.sillmarkMailTransport?.transport.close();
    cache.sillmarkMailTransport = { key, transport: created };
  }
  return cache.sillmarkMailTransport.transport;
}

/**
 * Sends over SMTP with nodemailer: to SMTP_URL when it is set, otherwise to the local fake SMTP server on loopback,
 * which keeps every message in the outbox (admin → Mail outbox), so nothing leaves the machine in development and demos.
 * Rejects when the server refuses the message; the error's message gives the server's reason.
 */
export async function sendMail(message: MailMessage): Promise<{ messageId: string }> {
  const info = await (await transport()).sendMail({ from: MAIL_FROM, ...message });
  return { messageId: info.messageId };
}
