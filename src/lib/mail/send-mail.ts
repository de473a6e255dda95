import 'server-only';
import { type Socket, connect } from 'node:net';
import nodemailer, { type Transporter } from 'nodemailer';
import type SMTPPool from 'nodemailer/lib/smtp-pool';
import type SMTPTransport from 'nodemailer/lib/smtp-transport';
import { LOCAL_SMTP_HOST, ensureLocalSmtpServer } from './local-smtp-server';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
  /** A Message-ID of our own (`<…@…>`), so a message can be found again in the outbox or at the provider. */
  messageId?: string;
  replyTo?: string;
  /** The sender shown to the recipient; default MAIL_FROM. Letters go out in the organisation's name. */
  from?: { name: string; address: string };
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

/**
 * A loopback connection with Nagle's algorithm off. nodemailer writes a message in pieces; with Nagle on, the last
 * piece waits for the server's delayed acknowledgement (about 40 ms on Linux) before it goes, for every message.
 */
function loopbackSocket(port: number) {
  return (_options: unknown, callback: (error: Error | null, socket?: { connection: Socket }) => void) => {
    const socket = connect({ host: LOCAL_SMTP_HOST, port });
    socket.setNoDelay(true);
    const refused = (error: Error) => callback(error);
    socket.once('error', refused);
    socket.once('connect', () => {
      socket.off('error', refused);
      callback(null, { connection: socket });
    });
  };
}

/**
 * nodemailer's options for SMTP_URL or for the local server. `pooled` keeps one connection open for many messages:
 * a batch then pays for the connection once (the local server alone waits 100 ms before its greeting, to catch
 * clients that talk too early).
 */
async function transportOptions(pooled: boolean): Promise<{ key: string; options: string | SMTPPool.Options | SMTPTransport.Options }> {
  const url = process.env.SMTP_URL;
  if (url) {
    if (!pooled) return { key: url, options: url };
    const withPool = new URL(url);
    withPool.searchParams.set('pool', 'true');
    withPool.searchParams.set('maxConnections', '1');
    return { key: withPool.toString(), options: withPool.toString() };
  }
  const port = await localPort();
  const local = { host: LOCAL_SMTP_HOST, port, secure: false, ignoreTLS: true, getSocket: loopbackSocket(port) };
  return { key: `local:${port}`, options: pooled ? { ...local, pool: true, maxConnections: 1 } : local };
}

async function transport(): Promise<Transporter> {
  const { key, options } = await transportOptions(false);
  if (cache.sillmarkMailTransport?.key !== key) {
    const created = nodemailer.createTransport(options);
    cache.sillmarkMailTransport?.transport.close();
    cache.sillmarkMailTransport = { key, transport: created };
  }
  return cache.sillmarkMailTransport.transport;
}

const sendWith = async (via: Transporter, message: MailMessage) => ({ messageId: (await via.sendMail({ from: MAIL_FROM, ...message })).messageId as string });

/**
 * Sends over SMTP with nodemailer: to SMTP_URL when it is set, otherwise to the local fake SMTP server on loopback,
 * which keeps every message in the outbox (admin → Mail outbox), so nothing leaves the machine in development and demos.
 * Rejects when the server refuses the message; the error's message gives the server's reason.
 */
export async function sendMail(message: MailMessage): Promise<{ messageId: string }> {
  return sendWith(await transport(), message);
}

/** For a batch: messages go one after another over one kept-open connection, closed by `close()` when the batch is done. */
export async function openMailRun(): Promise<{ send: (message: MailMessage) => Promise<{ messageId: string }>; close: () => void }> {
  const pooled = nodemailer.createTransport((await transportOptions(true)).options);
  return { send: (message) => sendWith(pooled, message), close: () => pooled.close() };
}
