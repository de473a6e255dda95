import type { User } from 'lucia';
import { vi } from 'vitest';

// Route handlers and actions read the session through getCurrentSession(); outside Next there is no request
// cookie store, so tests choose the signed-in user here. Everything behind it (roles, use cases, SQLite) is real.
const state: { user: User | null } = { user: null };

export function signedInAs(user: User | null): void {
  state.user = user;
}

vi.mock('@/lib/auth/current-session', () => ({
  getCurrentSession: async () => (state.user ? { user: state.user, session: { id: 'test-session', userId: state.user.id, fresh: false, expiresAt: new Date(Date.now() + 3600_000) } } : { user: null, session: null }),
}));

vi.mock('next/cache', () => ({ revalidatePath: () => undefined, revalidateTag: () => undefined }));

vi.mock('next/headers', () => ({
  cookies: async () => ({ get: () => undefined, set: () => undefined, delete: () => undefined, has: () => false }),
  headers: async () => new Headers({ host: 'localhost:3000' }),
}));
