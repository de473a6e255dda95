import 'server-only';
import { SequelizeStorage, Umzug } from 'umzug';
import { MIGRATIONS } from '../../../db/migrations';
import { getSequelize } from './sequelize';

/** umzug over db/migrations, recording what ran in the table `schema_migrations`. Run by db/migrate.ts, never by Next. */
export function migrator() {
  const sequelize = getSequelize();
  return new Umzug({
    migrations: MIGRATIONS.map((m) => ({ name: m.name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

export async function migrateToLatest(): Promise<string[]> {
  const sequelize = getSequelize();
  // WAL lets the portal read while a writer commits; it is a property of the file, so setting it once here is enough.
  await sequelize.query('PRAGMA journal_mode = WAL');
  const applied = await migrator().up();
  return applied.map((m) => m.name);
}
