import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { closeSequelize } from '@/lib/db';
import { migrateToLatest } from '@/lib/db/migrator';

/** A fresh, migrated SQLite file in a temp folder for one test file; never a mock of the database. */
export async function useTestDatabase(): Promise<{ file: string; cleanup: () => Promise<void> }> {
  const folder = mkdtempSync(path.join(tmpdir(), 'sillmark-it-'));
  const file = path.join(folder, 'test.sqlite');
  process.env.DATABASE_PATH = file;
  await migrateToLatest();
  return {
    file,
    cleanup: async () => {
      await closeSequelize();
      rmSync(folder, { recursive: true, force: true });
    },
  };
}
