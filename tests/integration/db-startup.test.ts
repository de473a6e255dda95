import { spawnSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { explainStartupFailure } from '../../db/startup-failure';

/** Whether this machine lets the test mount a tiny tmpfs in a private mount namespace (root, or unprivileged user namespaces). */
const asRoot = process.getuid?.() === 0;
const unshareArgs = asRoot ? ['--mount'] : ['--user', '--map-root-user', '--mount'];
const canMountTinyDisk = spawnSync('unshare', [...unshareArgs, 'sh', '-c', 'd=$(mktemp -d) && mount -t tmpfs -o size=64k tmpfs "$d"'], { encoding: 'utf8' }).status === 0;

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

  // A real full disk: a 256 KiB tmpfs, mounted in a mount namespace of the migration's own so nothing is left mounted.
  it.skipIf(!canMountTinyDisk)('explains a disk that fills up during the first migration', () => {
    const folder = mkdtempSync(path.join(tmpdir(), 'sillmark-full-'));
    const file = path.join(folder, 'db.sqlite');
    const script = 'mount -t tmpfs -o size=256k tmpfs "$1" && exec npm run --silent db:migrate';
    const result = spawnSync('unshare', [...unshareArgs, 'sh', '-c', script, 'sh', folder], { env: { ...process.env, DATABASE_PATH: file }, encoding: 'utf8' });
    expect(result.status).not.toBe(0);
    expect(result.stderr).toMatch(/Cannot write the database at .*: the disk is full\. Free some space and start again\./);
    expect(result.stderr).toMatch(/SQLITE_FULL/);
    expect(result.stderr).not.toMatch(/\n\s+at /);
  });

  it('names a full disk, a refused write and a locked file in words', () => {
    expect(explainStartupFailure(new Error('SQLITE_FULL: database or disk is full'), '/x.sqlite')).toMatch(/disk is full/);
    expect(explainStartupFailure(new Error('SQLITE_BUSY: database is locked'), '/x.sqlite')).toMatch(/locked by another process/);
    expect(explainStartupFailure(new Error('SQLITE_IOERR: disk I/O error'), '/x.sqlite')).toMatch(/refused the write \(a file-size limit/);
  });
});
