import 'server-only';
import { Lucia, TimeSpan } from 'lucia';
import { databasePath } from '@/lib/db/database-path';
import type { Role } from './roles';
import { sessionAdapter } from './session-store';

interface UserRow {
  email: string;
  name: string;
  role: Role;
  status: string;
}

const cache = globalThis as unknown as { sillmarkLucia?: { path: string; lucia: ReturnType<typeof createLucia> } };

/** Cookies are Secure except where explicitly switched off for plain-HTTP local use (COOKIE_SECURE=false). */
export function cookiesAreSecure(): boolean {
  if (process.env.COOKIE_SECURE === 'false') return false;
  if (process.env.COOKIE_SECURE === 'true') return true;
  return process.env.NODE_ENV === 'production';
}

const SESSION_HOURS = 12;

function createLucia() {
  return new Lucia(sessionAdapter(), {
    sessionExpiresIn: new TimeSpan(SESSION_HOURS, 'h'),
    // The cookie lives as long as the session (Lucia renews both together), not the browser's 400-day maximum.
    sessionCookie: { name: 'sillmark_session', expires: true, attributes: { secure: cookiesAreSecure(), sameSite: 'lax' } },
    getUserAttributes: (row) => ({ email: row.email, name: row.name, role: row.role, status: row.status }),
  });
}

export function lucia() {
  const file = databasePath();
  if (!cache.sillmarkLucia || cache.sillmarkLucia.path !== file) cache.sillmarkLucia = { path: file, lucia: createLucia() };
  return cache.sillmarkLucia.lucia;
}

declare module 'lucia' {
  interface Register {
    Lucia: ReturnType<typeof createLucia>;
    DatabaseUserAttributes: UserRow;
  }
}
