import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { lucia } from '@/lib/auth/lucia';
import { signIn } from '@/lib/auth/sign-in';
import { clearFailures, MAX_FAILURES } from '@/lib/auth/sign-in-throttle';
import { signInAction } from '@/app/(auth)/sign-in/actions';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
beforeAll(async () => (db = await useTestDatabase()));
afterAll(async () => db.cleanup());

describe('signing in', () => {
  let account: Awaited<ReturnType<typeof createTestUser>>;
  beforeEach(async () => {
    account = await createTestUser('designer');
    clearFailures(account.user.email);
  });

  it('opens a new session for the right password and invalidates the one presented before (fixation)', async () => {
    const planted = await lucia().createSession(account.user.id, {});
    const { session, cookie } = await signIn({ email: account.user.email.toUpperCase(), password: account.password, previousSessionId: planted.id });
    expect(session.id).not.toBe(planted.id);
    expect(cookie.attributes).toMatchObject({ httpOnly: true, sameSite: 'lax', path: '/' });
    expect((await lucia().validateSession(planted.id)).session).toBeNull();
    expect((await lucia().validateSession(session.id)).user?.id).toBe(account.user.id);
  });

  it('refuses a wrong password with a clear message and stores nothing', async () => {
    const before = await tableSnapshot();
    await expect(signIn({ email: account.user.email, password: 'wrong-password' })).rejects.toMatchObject({ status: 401, message: expect.stringContaining('do not match an active account') });
    expect(await tableSnapshot()).toEqual(before);
  });

  it('refuses an unknown user with the same message and stores nothing', async () => {
    const before = await tableSnapshot();
    await expect(signIn({ email: 'nobody@example.test', password: 'whatever-it-is' })).rejects.toMatchObject({ status: 401, message: expect.stringContaining('do not match an active account') });
    expect(await tableSnapshot()).toEqual(before);
  });

  it('refuses an invited account that has not set its password', async () => {
    const invited = await createTestUser('checker', { status: 'invited' });
    await expect(signIn({ email: invited.user.email, password: invited.password })).rejects.toMatchObject({ status: 401 });
  });

  it('throttles an address after repeated failures, even with the right password, and stores nothing', async () => {
    for (let i = 0; i < MAX_FAILURES; i++) await expect(signIn({ email: account.user.email, password: `wrong-${i}` })).rejects.toMatchObject({ status: 401 });
    const before = await tableSnapshot();
    await expect(signIn({ email: account.user.email, password: account.password })).rejects.toMatchObject({ status: 429, message: expect.stringMatching(/Too many failed sign-ins.*Try again in \d+ minute/) });
    expect(await tableSnapshot()).toEqual(before);
  });

  it('answers malformed form input with field messages and stores nothing', async () => {
    const before = await tableSnapshot();
    const result = await signInAction({ email: 'not-an-address', password: '' });
    expect(result).toMatchObject({ ok: false, status: 400 });
    if (result.ok) throw new Error('unreachable');
    expect(result.issues.map((i) => i.path).sort()).toEqual(['email', 'password']);
    expect(result.issues.find((i) => i.path === 'email')?.message).toMatch(/e-mail address/);
    expect(await tableSnapshot()).toEqual(before);
  });
});
