import { describe, expect, it } from 'vitest';
import { MAX_FAILURES, WINDOW_MS, clearFailures, lockedForMs, recordFailure } from '@/lib/auth/sign-in-throttle';

describe('sign-in throttle', () => {
  it('locks an address after the maximum failures within the window and releases it after', () => {
    const email = 'throttle@example.test';
    clearFailures(email);
    const t0 = 1_000_000;
    for (let i = 0; i < MAX_FAILURES - 1; i++) recordFailure(email, t0 + i);
    expect(lockedForMs(email, t0 + MAX_FAILURES)).toBe(0);
    recordFailure(email, t0 + MAX_FAILURES);
    expect(lockedForMs(email, t0 + MAX_FAILURES + 1)).toBeGreaterThan(WINDOW_MS - 100);
    expect(lockedForMs(email, t0 + WINDOW_MS + MAX_FAILURES + 1)).toBe(0);
  });

  it('keeps addresses apart', () => {
    clearFailures('a@example.test');
    for (let i = 0; i < MAX_FAILURES; i++) recordFailure('a@example.test', 5);
    expect(lockedForMs('b@example.test', 6)).toBe(0);
  });
});
