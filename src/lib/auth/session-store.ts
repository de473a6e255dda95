import 'server-only';
import { LibSQLAdapter } from '@lucia-auth/adapter-sqlite';
import type { Adapter, DatabaseSession, DatabaseUser } from 'lucia';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db/sequelize';

type SqlArgument = string | number | null;

interface SessionAndUserRow {
  session_id: string;
  user_id: string;
  expires_at: number;
  email: string;
  name: string;
  role: string;
  status: string;
}

// Every signed-in request reads its session: one query joining the session to the four user columns the portal
// uses, instead of the adapter's two (a session query and a `users.*` join that also carried the password hash).
const SESSION_AND_USER = `SELECT s.id AS session_id, s.user_id, s.expires_at, u.email, u.name, u.role, u.status
  FROM sessions s JOIN users u ON u.id = s.user_id WHERE s.id = ?`;

async function sessionAndUser(sessionId: string): Promise<[DatabaseSession | null, DatabaseUser | null]> {
  const [row] = await getSequelize().query<SessionAndUserRow>(SESSION_AND_USER, { replacements: [sessionId], type: QueryTypes.SELECT });
  if (!row) return [null, null];
  const session: DatabaseSession = { id: row.session_id, userId: row.user_id, expiresAt: new Date(row.expires_at * 1000), attributes: {} };
  const user: DatabaseUser = { id: row.user_id, attributes: { email: row.email, name: row.name, role: row.role, status: row.status } as DatabaseUser['attributes'] };
  return [session, user];
}

/**
 * Lucia's SQLite adapter, with its SQL run through Sequelize's sqlite3 connection (the adapter's libSQL driver only
 * needs an `execute({ sql, args }) → { rows }` client). The server process thus holds one copy of SQLite: two copies
 * (node-sqlite3 and better-sqlite3) in one process cannot see each other's POSIX locks and can corrupt the file
 * (SQLite documentation, "How To Corrupt An SQLite Database File", section on multiple copies of SQLite in one application).
 */
export function sessionAdapter(): Adapter {
  const client = {
    async execute({ sql, args }: { sql: string; args: SqlArgument[] }) {
      const sequelize = getSequelize();
      const isRead = /^\s*select/i.test(sql);
      const rows = isRead ? await sequelize.query(sql, { replacements: args, type: QueryTypes.SELECT }) : (await sequelize.query(sql, { replacements: args, type: QueryTypes.RAW }), []);
      return { rows };
    },
  };
  const adapter = new LibSQLAdapter(client as unknown as ConstructorParameters<typeof LibSQLAdapter>[0], { user: 'users', session: 'sessions' });
  adapter.getSessionAndUser = sessionAndUser;
  return adapter;
}
