import 'server-only';

// Failed sign-ins are counted in memory per e-mail address, so a refused sign-in stores nothing.
// Five failures within fifteen minutes lock that address for fifteen minutes (OWASP Authentication Cheat Sheet, account lockout).
export const MAX_FAILURES = 5;
export const WINDOW_MS = 15 * 60 * 1000;

const failures = (globalThis as unknown as { sillmarkSignInFailures?: Map<string, number[]> });
function store(): Map<string, number[]> {
  failures.sillmarkSignInFailures ??= new Map();
  return failures.sillmarkSignInFailures;
}

function recent(email: string, now: number): number[] {
  const kept = (store().get(email) ?? []).filter((t) => now - t < WINDOW_MS);
  if (kept.length) store().set(email, kept);
  else store().delete(email);
  return kept;
}

/** Milliseconds until the address may try again, or 0 when it is not locked. */
export function lockedForMs(email: string, now = Date.now()): number {
  const times = recent(email, now);
  if (times.length < MAX_FAILURES) return 0;
  return WINDOW_MS - (now - times[times.length - MAX_FAILURES]);
}

export function recordFailure(email: string, now = Date.now()): void {
  store().set(email, [...recent(email, now), now]);
}

export function clearFailures(email: string): void {
  store().delete(email);
}
