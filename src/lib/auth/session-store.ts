import 'server-only';
import { LibSQLAdapter } from '@lucia-auth/adapter-sqlite';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db/sequelize';

type SqlArgument = string | number | null;

/**
 * Lucia's SQLite adapter, with its SQL run through Sequelize's sqlite3 connection (the adapter's libSQL driver only
 * needs an `execute({ sql, args }) → { rows }` client). The server process thus holds one copy of SQLite: two copies
 * (node-sqlite3 and better-sqlite3) in one process cannot see each other's POSIX locks and can corrupt the file
 * (SQLite documentation, "How To Corrupt An SQLite Database File", section on multiple copies of SQLite in one application).
 */
export function sessionAdapter() {
  const client = {
    async execute({ sql, args }: { sql: string; args: SqlArgument[] }) {
      const sequelize = getSequelize();
      const isRead = /^\s*select/i.test(sql);
      const rows = isRead ? await sequelize.query(sql, { replacements: args, type: QueryTypes.SELECT }) : (await sequelize.query(sql, { replacements: args, type: QueryTypes.RAW }), []);
      return { rows };
    },
  };
  return new LibSQLAdapter(client as unknown as ConstructorParameters<typeof LibSQLAdapter>[0], { user: 'users', session: 'sessions' });
}
