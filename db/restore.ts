// `npm run db:restore -- BACKUP`: replaces DATABASE_PATH by a checked backup. Stop the portal first.
import path from 'node:path';
import { restoreDatabase } from '@/lib/db/backup-database';
import { databasePath } from '@/lib/db/database-path';

const backup = process.argv[2];
if (!backup) {
  console.error('Name the backup file: npm run db:restore -- path/to/backup.sqlite');
  process.exit(2);
}
try {
  restoreDatabase({ backup: path.resolve(backup), target: databasePath() });
  console.log(`Restored ${databasePath()} from ${backup}.`);
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
}
