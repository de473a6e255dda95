import 'server-only';
import { DEFAULT_LOCAL_SMTP_PORT, startLocalSmtpServer } from './local-smtp-server';
import { startMailDeliverer } from './mail-deliverer';

async function startLocalSmtp(): Promise<void> {
  const port = process.env.SMTP_PORT ? Number(process.env.SMTP_PORT) : DEFAULT_LOCAL_SMTP_PORT;
  try {
    const server = await startLocalSmtpServer(port);
    console.log(`Local SMTP outbox listening on 127.0.0.1:${server.port} (set SMTP_URL to send real mail).`);
  } catch (error) {
    console.warn(`The local SMTP outbox could not listen on 127.0.0.1:${port}: ${(error as Error).message}. ${process.env.SMTP_PORT ? 'Mail will go to the server already listening there.' : 'An outbox on a free port will start when mail is first sent.'}`);
  }
}

/** At server start: the local SMTP server (unless SMTP_URL is set), then the deliverer of queued e-mail. */
export async function startMailServices(): Promise<void> {
  if (!process.env.SMTP_URL) await startLocalSmtp();
  startMailDeliverer();
}
