import 'server-only';
import { deliverOutboundMail } from './deliver-outbound-mail';

const EVERY_MS = 30_000;

// One loop per process, kept on globalThis: Next loads instrumentation and route bundles as separate module copies.
const state = globalThis as unknown as { sillmarkMailDeliverer?: { timer: NodeJS.Timeout; running: boolean } };

async function deliverDue(): Promise<void> {
  const loop = state.sillmarkMailDeliverer;
  if (!loop || loop.running) return;
  loop.running = true;
  try {
    // Rounds of 50 until nothing is due, so a backlog after downtime drains without waiting for the next tick.
    for (let round = 0; round < 20; round++) {
      const report = await deliverOutboundMail();
      if (report.delivered + report.retrying + report.failed === 0) break;
    }
  } catch (error) {
    console.error('Delivering queued e-mail failed; the next round tries again.', error);
  } finally {
    loop.running = false;
  }
}

/**
 * Delivers what is due now (mail queued before a crash or a restart) and then every 30 s (retries after backoff).
 * Messages a request has just committed are sent by that request; this loop catches whatever it could not send.
 */
export function startMailDeliverer(): void {
  if (state.sillmarkMailDeliverer) return;
  const timer = setInterval(() => void deliverDue(), EVERY_MS);
  timer.unref();
  state.sillmarkMailDeliverer = { timer, running: false };
  void deliverDue();
}

export function stopMailDeliverer(): void {
  if (state.sillmarkMailDeliverer) clearInterval(state.sillmarkMailDeliverer.timer);
  state.sillmarkMailDeliverer = undefined;
}
