// `npm run db:backup [-- DESTINATION]`: an online, consistent copy of DATABASE_PATH (default into db/data/backups/).
import path from 'node:path';
import { backupDatabase } from '@/lib/db/backup-database';
import { databasePath } from '@/lib/db/database-path';

const stamp = new Date().toISOString().replace(/[:.]/g, '-');
const destination = path.resolve(process.argv[2] ?? path.join(path.dirname(databasePath()), 'backups', `sillmark-${stamp}.sqlite`));
try {
  const { pages } = await backupDatabase({ source: databasePath(), destination });
  console.log(`Backed up ${databasePath()} to ${destination} (${pages} pages, integrity ok).`);
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
}
