import { spawn } from 'node:child_process';

/**
 * Holds the database's write lock from ANOTHER process for a while, as a second server or a CLI would.
 * (Inside one process, POSIX locks do not exclude each other, so only a separate process tests the busy path.)
 */
export function holdWriteLockInAnotherProcess(file: string, milliseconds: number): Promise<{ released: Promise<string> }> {
  const script = `
    const Database = require('better-sqlite3');
    const db = new Database(process.argv[1]);
    db.exec('BEGIN IMMEDIATE');
    process.stdout.write('locked\\n');
    setTimeout(() => { const at = new Date().toISOString(); db.exec('ROLLBACK'); db.close(); process.stdout.write('released ' + at + '\\n'); }, Number(process.argv[2]));
  `;
  const child = spawn(process.execPath, ['-e', script, file, String(milliseconds)], { stdio: ['ignore', 'pipe', 'inherit'] });
  let output = '';
  child.stdout.on('data', (chunk) => (output += chunk));
  const released = new Promise<string>((resolve) => child.on('exit', () => resolve(/released (\S+)/.exec(output)?.[1] ?? '')));
  return new Promise((resolve, reject) => {
    child.stdout.once('data', () => resolve({ released }));
    child.once('error', reject);
  });
}
