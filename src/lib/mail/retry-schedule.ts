// How long a claimed message may be "sending" before another deliverer may take it again: longer than any SMTP
// exchange should last, so a live sender is never doubled, short enough that a crashed one is soon replaced.
export const SENDING_LEASE_MS = 2 * 60_000;
export const MAX_ATTEMPTS = 10;

const FIRST_RETRY_MS = 60_000;
const LONGEST_WAIT_MS = 60 * 60_000;

/** The wait before the next attempt after `attempts` failed ones: 1, 2, 4, 8 … minutes, at most an hour. */
export function retryDelayMs(attempts: number): number {
  return Math.min(FIRST_RETRY_MS * 2 ** Math.max(0, attempts - 1), LONGEST_WAIT_MS);
}

/** An SMTP reply in the 500s is the server's final "no" (unknown mailbox, refused content): retrying cannot help. */
export function isPermanentRefusal(error: unknown): boolean {
  const code = (error as { responseCode?: unknown } | null)?.responseCode;
  return typeof code === 'number' && code >= 500 && code < 600;
}
