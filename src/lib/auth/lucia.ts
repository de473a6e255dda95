import 'server-only';
import Database from 'better-sqlite3';
import { BetterSqlite3Adapter } from '@lucia-auth/adapter-sqlite';
import { Lucia, TimeSpan } from 'lucia';
import { databasePath } from '@/lib/db/database-path';
import { BUSY_TIMEOUT_MS } from '@/lib/db/sqlite-driver';
import type { Role } from './roles';

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

function createLucia(file: string) {
  const connection = new Database(file);
  connection.pragma(`busy_timeout = ${BUSY_TIMEOUT_MS}`);
  connection.pragma('foreign_keys = ON');
  const adapter = new BetterSqlite3Adapter(connection, { user: 'users', session: 'sessions' });
  return new Lucia(adapter, {
    sessionExpiresIn: new TimeSpan(12, 'h'),
    sessionCookie: { name: 'sillmark_session', expires: false, attributes: { secure: cookiesAreSecure(), sameSite: 'lax' } },
    getUserAttributes: (row) => ({ email: row.email, name: row.name, role: row.role, status: row.status }),
  });
}

export function lucia() {
  const file = databasePath();
  if (!cache.sillmarkLucia || cache.sillmarkLucia.path !== file) cache.sillmarkLucia = { path: file, lucia: createLucia(file) };
  return cache.sillmarkLucia.lucia;
}

declare module 'lucia' {
  interface Register {
    Lucia: ReturnType<typeof createLucia>;
    DatabaseUserAttributes: UserRow;
  }
}
