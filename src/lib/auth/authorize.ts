import 'server-only';
import { ForbiddenError, UnauthenticatedError } from '@/lib/http/app-errors';
import { getCurrentSession, type SessionUser } from './current-session';
import type { Role } from './roles';

/** For route handlers and server actions: the signed-in user holding one of the roles, or a typed 401/403. */
export async function requireRole(roles: readonly Role[]): Promise<SessionUser> {
  const { user } = await getCurrentSession();
  if (!user) throw new UnauthenticatedError();
  if (!roles.includes(user.role)) throw new ForbiddenError(`This needs the role ${roles.join(' or ')}; you are signed in as ${user.role}.`);
  return user;
}

export const ANY_ROLE: readonly Role[] = ['designer', 'checker', 'liaison', 'planning', 'admin'];
