import { spawn, spawnSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import { restoreDatabase } from '@/lib/db/backup-database';
import { database } from '@/lib/db';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
beforeAll(async () => (db = await useTestDatabase()));
afterAll(async () => db.cleanup());

const count = (file: string, table: string) => {
  const conn = new Database(file, { readonly: true });
  try {
    return (conn.prepare(`SELECT COUNT(*) AS n FROM ${table}`).get() as { n: number }).n;
  } finally {
    conn.close();
  }
};

describe('database backup and restore', () => {
  it('copies a live database consistently while writes go on, and the copy restores', async () => {
    for (let i = 0; i < 5; i++) await createTestUser('designer');
    const sequelize = database();
    const folder = mkdtempSync(path.join(tmpdir(), 'sillmark-backup-'));
    const writes = (async () => {
      for (let i = 0; i < 40; i++) await sequelize.transaction((t) => recordAuditEvent({ actorId: null, action: `during.backup.${i}`, entityType: 'test' }, t));
    })();
    // The backup runs in its own process, as `npm run db:backup` does beside a running portal.
    const destination = path.join(folder, 'copy.sqlite');
    const backup = spawn('npm', ['run', '--silent', 'db:backup', '--', destination], { env: { ...process.env, DATABASE_PATH: db.file } });
    const exitCode = await new Promise<number | null>((resolve) => backup.on('exit', resolve));
    await writes;
    expect(exitCode).toBe(0);
    const usersInCopy = count(destination, 'users');
    expect(usersInCopy).toBe(5);
    const eventsInCopy = count(destination, 'audit_events');
    expect(eventsInCopy).toBeGreaterThanOrEqual(0);
    expect(eventsInCopy).toBeLessThanOrEqual(40);

    const restored = path.join(folder, 'restored', 'sillmark.sqlite');
    restoreDatabase({ backup: destination, target: restored });
    expect(count(restored, 'users')).toBe(5);
    expect(count(restored, 'audit_events')).toBe(eventsInCopy);
  });

  it('runs as `npm run db:backup` and reports a missing database plainly', () => {
    const folder = mkdtempSync(path.join(tmpdir(), 'sillmark-backup-cli-'));
    const ok = spawnSync('npm', ['run', '--silent', 'db:backup', '--', path.join(folder, 'cli-copy.sqlite')], { env: { ...process.env, DATABASE_PATH: db.file }, encoding: 'utf8' });
    expect(ok.status, ok.stderr).toBe(0);
    expect(ok.stdout).toMatch(/integrity ok/);
    const missing = spawnSync('npm', ['run', '--silent', 'db:backup'], { env: { ...process.env, DATABASE_PATH: path.join(folder, 'absent.sqlite') }, encoding: 'utf8' });
    expect(missing.status).not.toBe(0);
    expect(missing.stderr).toMatch(/There is no database at/);
  });
});
