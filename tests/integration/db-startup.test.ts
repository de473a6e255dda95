import { spawnSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { explainStartupFailure } from '../../db/startup-failure';

const migrate = (databasePath: string) => spawnSync('npm', ['run', '--silent', 'db:migrate'], { env: { ...process.env, DATABASE_PATH: databasePath }, encoding: 'utf8' });

describe('starting on a database that cannot be written', () => {
  it('migrates a fresh file and is idempotent', () => {
    const file = path.join(mkdtempSync(path.join(tmpdir(), 'sillmark-start-')), 'nested', 'db.sqlite');
    expect(migrate(file).stdout).toMatch(/Migrated/);
    expect(migrate(file).stdout).toMatch(/up to date/);
  });

  it('explains a path whose folder is a file (unwritable for root too)', () => {
    const folder = mkdtempSync(path.join(tmpdir(), 'sillmark-bad-'));
    spawnSync('touch', [path.join(folder, 'plain-file')]);
    const result = migrate(path.join(folder, 'plain-file', 'db.sqlite'));
    expect(result.status).not.toBe(0);
    expect(result.stderr).toMatch(/Cannot open the database|Could not prepare the database/);
    expect(result.stderr).not.toMatch(/\n\s+at /);
  });

  it('names a full disk and a locked file in words', () => {
    expect(explainStartupFailure(new Error('SQLITE_FULL: database or disk is full'), '/x.sqlite')).toMatch(/disk is full/);
    expect(explainStartupFailure(new Error('SQLITE_BUSY: database is locked'), '/x.sqlite')).toMatch(/locked by another process/);
  });
});
