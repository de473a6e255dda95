import 'server-only';
import { cookies } from 'next/headers';
import { cache } from 'react';
import type { Session, User } from 'lucia';
import { lucia } from './lucia';

export type SessionUser = User;
export type CurrentSession = { user: SessionUser; session: Session } | { user: null; session: null };

/**
 * The signed-in user for this request, read once per render (React cache) by layouts, pages, actions and handlers.
 * Renews the cookie when Lucia extends the session; setting cookies fails during a page render, which is harmless.
 */
export const getCurrentSession = cache(async (): Promise<CurrentSession> => {
  const store = await cookies();
  const auth = lucia();
  const sessionId = store.get(auth.sessionCookieName)?.value ?? null;
  if (!sessionId) return { user: null, session: null };
  const result = await auth.validateSession(sessionId);
  try {
    if (result.session?.fresh) {
      const cookie = auth.createSessionCookie(result.session.id);
      store.set(cookie.name, cookie.value, cookie.attributes);
    }
    if (!result.session) {
      const cookie = auth.createBlankSessionCookie();
      store.set(cookie.name, cookie.value, cookie.attributes);
    }
  } catch {
    // Server Components may not set cookies; the proxy or the next action will.
  }
  if (!result.session || !result.user || result.user.status !== 'active') return { user: null, session: null };
  return { user: result.user, session: result.session };
});
