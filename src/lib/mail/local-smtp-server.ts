import 'server-only';
import type { AddressInfo } from 'node:net';
import { SMTPServer, type SMTPServerDataStream, type SMTPServerSession } from 'smtp-server';
import { storeOutboxMessage } from './store-outbox-message';

export const LOCAL_SMTP_HOST = '127.0.0.1';
export const DEFAULT_LOCAL_SMTP_PORT = 2525;
const MAX_MESSAGE_BYTES = 25 * 1024 * 1024;

export interface LocalSmtpServer {
  port: number;
  stop(): Promise<void>;
}

// One server per process, kept on globalThis: Next loads instrumentation and route bundles as separate module copies.
const state = globalThis as unknown as { sillmarkLocalSmtp?: Promise<LocalSmtpServer> };

function readAll(stream: SMTPServerDataStream): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    stream.on('data', (chunk: Buffer) => chunks.push(chunk));
    stream.on('error', reject);
    stream.on('end', () => resolve(Buffer.concat(chunks)));
  });
}

function rejection(message: string, responseCode: number): Error {
  return Object.assign(new Error(message), { responseCode });
}

async function receive(stream: SMTPServerDataStream, session: SMTPServerSession): Promise<void> {
  const raw = await readAll(stream);
  if (stream.sizeExceeded) throw rejection(`The message is larger than ${MAX_MESSAGE_BYTES / 1024 / 1024} MiB.`, 552);
  const from = session.envelope.mailFrom;
  // Stored before the 250 reply, so a sender that got "accepted" can always find its message in the outbox.
  await storeOutboxMessage({ raw, envelopeFrom: from ? from.address : '', envelopeTo: session.envelope.rcptTo.map((r) => r.address) });
}

function createServer(): SMTPServer {
  return new SMTPServer({
    name: 'sillmark-local-outbox',
    banner: 'Sillmark local outbox: messages are kept on this machine and never relayed',
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    // Every client is on loopback: asking DNS for 127.0.0.1's name only risks a resolver timeout.
    disableReverseLookup: true,
    // Addresses under the reserved .invalid top-level domain (RFC 2606) cannot exist, so they are refused as a real server would.
    onRcptTo(address, _session, callback) {
      if (/\.invalid$/i.test(address.address)) return callback(rejection(`Mailbox ${address.address} does not exist (the .invalid domain is reserved).`, 550));
      callback();
    },
    onData(stream, session, callback) {
      receive(stream, session).then(() => callback(), (error: Error) => callback(error));
    },
  });
}

function listen(port: number): Promise<LocalSmtpServer> {
  const server = createServer();
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, LOCAL_SMTP_HOST, () => {
      server.off('error', reject);
      server.on('error', (error) => console.error('Local SMTP server error', error));
      const stop = () => new Promise<void>((done) => server.close(() => done()));
      resolve({ port: (server.server.address() as AddressInfo).port, stop });
    });
  });
}

/**
 * Starts the fake SMTP server on loopback, or returns the one this process already runs (a second call never
 * starts a second server). `port` 0 picks a free port, as tests do.
 */
export function startLocalSmtpServer(port: number): Promise<LocalSmtpServer> {
  if (!state.sillmarkLocalSmtp) {
    state.sillmarkLocalSmtp = listen(port).catch((error: unknown) => {
      state.sillmarkLocalSmtp = undefined;
      throw error;
    });
  }
  return state.sillmarkLocalSmtp;
}

/** The running server, started on demand on SMTP_PORT, or on a free port when SMTP_PORT is not set. */
export function ensureLocalSmtpServer(): Promise<LocalSmtpServer> {
  return startLocalSmtpServer(process.env.SMTP_PORT ? Number(process.env.SMTP_PORT) : 0);
}

export async function stopLocalSmtpServer(): Promise<void> {
  const running = state.sillmarkLocalSmtp;
  state.sillmarkLocalSmtp = undefined;
  if (running) await (await running.catch(() => null))?.stop();
}
