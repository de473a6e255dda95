// Next calls register() once when the server starts. Without SMTP_URL, the local fake SMTP server starts with the app,
// so mail sent by the portal lands in the outbox an admin can read. Then the mail deliverer starts: it sends what was
// queued and not yet delivered before the last stop (a crash included), and retries failed sends with backoff.
async function startLocalSmtp(): Promise<void> {
  const { DEFAULT_LOCAL_SMTP_PORT, startLocalSmtpServer } = await import('@/lib/mail/local-smtp-server');
  const port = process.env.SMTP_PORT ? Number(process.env.SMTP_PORT) : DEFAULT_LOCAL_SMTP_PORT;
  try {
    const server = await startLocalSmtpServer(port);
    console.log(`Local SMTP outbox listening on 127.0.0.1:${server.port} (set SMTP_URL to send real mail).`);
  } catch (error) {
    console.warn(`The local SMTP outbox could not listen on 127.0.0.1:${port}: ${(error as Error).message}. ${process.env.SMTP_PORT ? 'Mail will go to the server already listening there.' : 'An outbox on a free port will start when mail is first sent.'}`);
  }
}

export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  if (!process.env.SMTP_URL) await startLocalSmtp();
  const { startMailDeliverer } = await import('@/lib/mail/mail-deliverer');
  startMailDeliverer();
}
