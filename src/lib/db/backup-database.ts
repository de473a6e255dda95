import 'server-only';
import { copyFileSync, existsSync, mkdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { BUSY_TIMEOUT_MS } from './sqlite-driver';

/**
 * A consistent copy of a live database through SQLite's online backup API (better-sqlite3 `backup`),
 * safe while the portal keeps writing; the copy is checked with PRAGMA integrity_check before it is reported.
 */
export async function backupDatabase({ source, destination }: { source: string; destination: string }): Promise<{ destination: string; pages: number }> {
  if (!existsSync(source)) throw new Error(`There is no database at ${source} to back up.`);
  mkdirSync(path.dirname(destination), { recursive: true });
  const db = new Database(source, { readonly: true, fileMustExist: true });
  db.pragma(`busy_timeout = ${BUSY_TIMEOUT_MS}`);
  try {
    const progress = await db.backup(destination);
    assertIntact(destination);
    return { destination, pages: progress.totalPages };
  } finally {
    db.close();
  }
}

/** Replaces the database file by a backup; the portal must be stopped. The backup is checked first. */
export function restoreDatabase({ backup, target }: { backup: string; target: string }): void {
  assertIntact(backup);
  for (const suffix of ['-wal', '-shm']) rmSync(`${target}${suffix}`, { force: true });
  mkdirSync(path.dirname(target), { recursive: true });
  copyFileSync(backup, target);
}

function assertIntact(file: string): void {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    const result = db.pragma('integrity_check', { simple: true });
    if (result !== 'ok') throw new Error(`The database copy ${file} failed its integrity check: ${String(result)}`);
  } finally {
    db.close();
  }
}
