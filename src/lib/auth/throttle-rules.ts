// How many wrong passwords each scope may have before it must wait (OWASP Authentication Cheat Sheet: account lockout and
// login throttling; OWASP Blocking Brute Force Attacks: lock per account and client, slow down per account).
// A lock is keyed on the account *and* the client, so a stranger cannot lock the owner out; the account alone is only
// slowed down, with a short cap, so a guesser using many clients gets few tries and the owner at worst waits a minute.

export type ThrottleScope = 'account-client' | 'account' | 'client' | 'countersign';

interface LockRule {
  kind: 'lock';
  /** Failures within the window after which the scope is locked until the window ends. */
  limit: number;
  windowMs: number;
}

interface SlowDownRule {
  kind: 'slow-down';
  /** Failures within the window that need no wait; after that each failure doubles the wait, up to the cap. */
  free: number;
  firstWaitMs: number;
  capMs: number;
  windowMs: number;
}

export type ThrottleRule = LockRule | SlowDownRule;

const MINUTE = 60_000;

export const THROTTLE_RULES: Record<ThrottleScope, ThrottleRule> = {
  'account-client': { kind: 'lock', limit: 5, windowMs: 15 * MINUTE },
  account: { kind: 'slow-down', free: 10, firstWaitMs: 1000, capMs: MINUTE, windowMs: 15 * MINUTE },
  client: { kind: 'slow-down', free: 20, firstWaitMs: 1000, capMs: 15 * MINUTE, windowMs: 15 * MINUTE },
  // Re-entering the password to countersign: only the signed-in checker can reach it, so it is keyed on that user alone.
  countersign: { kind: 'lock', limit: 5, windowMs: 15 * MINUTE },
};

export interface AttemptCount {
  failures: number;
  windowStartedAt: number;
  lastFailureAt: number;
}

/** The failures that still count at `now`: none once the window has passed. */
export function currentFailures(rule: ThrottleRule, count: AttemptCount | null, now: number): number {
  if (!count || now - count.windowStartedAt >= rule.windowMs) return 0;
  return count.failures;
}

/** Milliseconds until the scope may try again, or 0 when it may try now. */
export function waitMs(rule: ThrottleRule, count: AttemptCount | null, now: number): number {
  const failures = currentFailures(rule, count, now);
  if (!count || failures === 0) return 0;
  const windowEnd = count.windowStartedAt + rule.windowMs;
  if (rule.kind === 'lock') return failures >= rule.limit ? windowEnd - now : 0;
  if (failures < rule.free) return 0;
  const gap = Math.min(rule.firstWaitMs * 2 ** (failures - rule.free), rule.capMs);
  return Math.max(0, Math.min(count.lastFailureAt + gap, windowEnd) - now);
}

/** The count after one more failure at `now` (a new window starts when the old one has passed). */
export function withFailure(rule: ThrottleRule, count: AttemptCount | null, now: number): AttemptCount {
  const failures = currentFailures(rule, count, now);
  return { failures: failures + 1, windowStartedAt: failures === 0 || !count ? now : count.windowStartedAt, lastFailureAt: now };
}

/** True when the failure that brought the count to `failures` is the one that starts a lock or a wait. */
export function startsRestriction(rule: ThrottleRule, failures: number): boolean {
  return rule.kind === 'lock' ? failures === rule.limit : failures === rule.free;
}

export function describeWait(ms: number): string {
  if (ms < 90_000) return `${Math.max(1, Math.ceil(ms / 1000))} second(s)`;
  return `${Math.ceil(ms / MINUTE)} minute(s)`;
}
