import 'server-only';
import { forbidden, redirect } from 'next/navigation';
import { getCurrentSession, type SessionUser } from './current-session';
import type { Role } from './roles';

/** For pages and layouts: redirects to sign-in when anonymous, renders the 403 page for the wrong role. */
export async function requirePageRole(roles: readonly Role[], returnTo?: string): Promise<SessionUser> {
  const { user } = await getCurrentSession();
  if (!user) redirect(returnTo ? `/sign-in?next=${encodeURIComponent(returnTo)}` : '/sign-in');
  if (!roles.includes(user.role)) forbidden();
  return user;
}
