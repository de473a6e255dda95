import { describe, expect, it } from 'vitest';
import { THROTTLE_RULES, startsRestriction, waitMs, withFailure, type AttemptCount, type ThrottleRule } from '@/lib/auth/throttle-rules';

const T0 = 1_000_000;
function failuresAt(rule: ThrottleRule, times: number[]): AttemptCount | null {
  return times.reduce<AttemptCount | null>((count, t) => withFailure(rule, count, t), null);
}

describe('a lock rule (account and client together)', () => {
  const rule = THROTTLE_RULES['account-client'];
  it('allows four failures, locks at the fifth until the window that began with the first has passed', () => {
    expect(waitMs(rule, failuresAt(rule, [T0, T0 + 1, T0 + 2, T0 + 3]), T0 + 4)).toBe(0);
    const five = failuresAt(rule, [T0, T0 + 1, T0 + 2, T0 + 3, T0 + 4]);
    expect(waitMs(rule, five, T0 + 5)).toBe(rule.windowMs - 5);
    expect(waitMs(rule, five, T0 + rule.windowMs)).toBe(0);
  });

  it('starts a fresh window after the old one has passed', () => {
    const old = failuresAt(rule, [T0, T0 + 1, T0 + 2, T0 + 3, T0 + 4]);
    expect(withFailure(rule, old, T0 + rule.windowMs)).toEqual({ failures: 1, windowStartedAt: T0 + rule.windowMs, lastFailureAt: T0 + rule.windowMs });
  });

  it('names the fifth failure as the one that starts the lock, and no other', () => {
    expect([1, 2, 3, 4, 5, 6].map((n) => startsRestriction(rule, n))).toEqual([false, false, false, false, true, false]);
  });
});

describe('a slow-down rule (the account alone)', () => {
  const rule = THROTTLE_RULES.account;
  if (rule.kind !== 'slow-down') throw new Error('the account rule is a slow-down');
  it('needs no wait for the free failures, then doubles the wait after each further failure', () => {
    const times = (n: number) => Array.from({ length: n }, (_, i) => T0 + i);
    expect(waitMs(rule, failuresAt(rule, times(rule.free - 1)), T0 + rule.free)).toBe(0);
    const last = (n: number) => T0 + n - 1;
    expect(waitMs(rule, failuresAt(rule, times(rule.free)), last(rule.free))).toBe(rule.firstWaitMs);
    expect(waitMs(rule, failuresAt(rule, times(rule.free + 1)), last(rule.free + 1))).toBe(2 * rule.firstWaitMs);
    expect(waitMs(rule, failuresAt(rule, times(rule.free + 2)), last(rule.free + 2))).toBe(4 * rule.firstWaitMs);
  });

  it('never makes the owner wait longer than the cap, however many guesses there were', () => {
    const many = failuresAt(rule, Array.from({ length: 200 }, (_, i) => T0 + i));
    expect(waitMs(rule, many, T0 + 199)).toBe(rule.capMs);
    expect(rule.capMs).toBeLessThanOrEqual(60_000);
  });
});
