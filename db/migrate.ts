// Brings the database at DATABASE_PATH to the latest schema. Run as `npm run db:migrate` (and by `npm start`).
import { closeSequelize } from '@/lib/db';
import { databasePath } from '@/lib/db/database-path';
import { migrateToLatest } from '@/lib/db/migrator';
import { explainStartupFailure } from './startup-failure';

try {
  const applied = await migrateToLatest();
  console.log(applied.length ? `Migrated ${databasePath()}: ${applied.join(', ')}` : `Database ${databasePath()} is up to date.`);
  await closeSequelize();
} catch (error) {
  console.error(explainStartupFailure(error, databasePath()));
  process.exit(1);
}
