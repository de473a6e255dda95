// Next calls register() once when the server starts. Without SMTP_URL, the local fake SMTP server starts with the app,
// so mail sent by the portal lands in the outbox an admin can read. Then the mail deliverer starts: it sends what was
// queued and not yet delivered before the last stop (a crash included), and retries failed sends with backoff.
// The imports stay inside the Node.js branch: Next also compiles this file for the edge runtime, where they cannot load.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME === 'nodejs') {
    const { startMailServices } = await import('@/lib/mail/start-mail-services');
    await startMailServices();
  }
}
