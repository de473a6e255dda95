import type { Role } from '@/lib/auth/roles';

// Who may call what. Every route handler method under src/app/api and every server action must appear here:
// the access test fails for anything missing, so a new route cannot ship without its roles being decided.
export type Access = 'public' | readonly Role[];
const ALL: readonly Role[] = ['designer', 'checker', 'liaison', 'planning', 'admin'];

export const ROUTE_ACCESS: Record<string, Partial<Record<'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE', Access>>> = {
  'api/health': { GET: 'public' },
  'api/session': { GET: ALL },
  'api/schemes': { GET: ALL },
  'api/admin/users': { GET: ['admin'], POST: ['admin'] },
  'api/admin/users/[id]': { PATCH: ['admin'] },
};

export const ACTION_ACCESS: Record<string, Record<string, Access>> = {
  '(auth)/sign-in': { signInAction: 'public' },
  '(auth)/invitation/[token]': { acceptInvitationAction: 'public' },
  '(portal)': { signOutAction: ALL },
  '(portal)/admin/users': { inviteUserAction: ['admin'], changeRoleAction: ['admin'] },
};
