// Removes stored files that no record refers to (left by a server killed mid-write). Run as `npm run db:sweep-files` and by `npm start`.
import { closeSequelize } from '@/lib/db';
import { databasePath } from '@/lib/db/database-path';
import { sweepUnreferencedFiles } from '@/lib/storage/sweep-unreferenced-files';
import { explainStartupFailure } from './startup-failure';

try {
  const report = await sweepUnreferencedFiles();
  const removed = Object.entries(report).filter(([, names]) => names.length > 0);
  console.log(removed.length ? `Removed files no record refers to: ${removed.map(([folder, names]) => `${names.length} in ${folder}/`).join(', ')}.` : 'Every stored file belongs to a record.');
  await closeSequelize();
} catch (error) {
  console.error(explainStartupFailure(error, databasePath()));
  process.exit(1);
}
