import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as listUsersRoute } from '@/app/api/admin/users/route';
import { cookiesAreSecure, lucia } from '@/lib/auth/lucia';
import { signOut } from '@/lib/auth/sign-out';
import { database } from '@/lib/db';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
beforeAll(async () => (db = await useTestDatabase()));
afterAll(async () => db.cleanup());

describe('sessions', () => {
  it('use HttpOnly, SameSite=Lax cookies that are Secure in production', () => {
    const cookie = lucia().createSessionCookie('example');
    expect(cookie.attributes).toMatchObject({ httpOnly: true, sameSite: 'lax', path: '/' });
    const saved = { node: process.env.NODE_ENV, secure: process.env.COOKIE_SECURE };
    try {
      Object.assign(process.env, { NODE_ENV: 'production' });
      delete process.env.COOKIE_SECURE;
      expect(cookiesAreSecure()).toBe(true);
      process.env.COOKIE_SECURE = 'false';
      expect(cookiesAreSecure()).toBe(false);
    } finally {
      Object.assign(process.env, { NODE_ENV: saved.node });
      if (saved.secure === undefined) delete process.env.COOKIE_SECURE;
      else process.env.COOKIE_SECURE = saved.secure;
    }
  });

  it('set a cookie that lives as long as the session, not for 400 days', async () => {
    const { user } = await createTestUser('liaison');
    const session = await lucia().createSession(user.id, {});
    const cookie = lucia().createSessionCookie(session.id);
    const sessionSeconds = (session.expiresAt.getTime() - Date.now()) / 1000;
    expect(cookie.attributes.maxAge).toBeDefined();
    expect(Math.abs((cookie.attributes.maxAge ?? 0) - sessionSeconds)).toBeLessThan(60);
    expect(cookie.serialize()).toMatch(/Max-Age=43200(;|$)/);
  });

  it('expire after twelve hours and are renewed when used in their second half', async () => {
    const { user } = await createTestUser('checker');
    const session = await lucia().createSession(user.id, {});
    const hours = (session.expiresAt.getTime() - Date.now()) / 3600_000;
    expect(hours).toBeGreaterThan(11.9);
    expect(hours).toBeLessThanOrEqual(12);
    await database().query('UPDATE sessions SET expires_at = ? WHERE id = ?', { replacements: [Math.floor(Date.now() / 1000) + 3600, session.id] });
    const renewed = await lucia().validateSession(session.id);
    expect(renewed.session?.fresh).toBe(true);
    expect((renewed.session!.expiresAt.getTime() - Date.now()) / 3600_000).toBeGreaterThan(11.9);
    await database().query('UPDATE sessions SET expires_at = ? WHERE id = ?', { replacements: [Math.floor(Date.now() / 1000) - 1, session.id] });
    expect((await lucia().validateSession(session.id)).session).toBeNull();
  });

  it('end everywhere at once when the user signs out everywhere', async () => {
    const { user } = await createTestUser('liaison');
    const a = await lucia().createSession(user.id, {});
    const b = await lucia().createSession(user.id, {});
    const other = await lucia().createSession((await createTestUser('liaison')).user.id, {});
    const blank = await signOut({ sessionId: a.id, userId: user.id, everywhere: true });
    expect(blank.value).toBe('');
    expect((await lucia().validateSession(a.id)).session).toBeNull();
    expect((await lucia().validateSession(b.id)).session).toBeNull();
    expect((await lucia().validateSession(other.id)).session).not.toBeNull();
  });

  it('never put password hashes in a response', async () => {
    signedInAs((await createTestUser('admin')).sessionUser);
    const response = await listUsersRoute(new Request('http://localhost/api/admin/users'), { params: Promise.resolve({}) });
    const text = await response.text();
    expect(response.status).toBe(200);
    expect(text).toContain('"users"');
    expect(text).not.toMatch(/password|argon2/i);
    signedInAs(null);
  });
});
