import sqlite3 from 'sqlite3';

export const BUSY_TIMEOUT_MS = 5000;

// Sequelize's SQLite dialect opens a new connection per transaction and offers no connect hook,
// so the busy timeout is set in the driver's constructor: a writer waits for a lock instead of failing.
class BusyTolerantDatabase extends sqlite3.Database {
  constructor(filename: string, mode?: number, callback?: (err: Error | null) => void) {
    super(filename, mode ?? sqlite3.OPEN_READWRITE | sqlite3.OPEN_CREATE, callback);
    this.configure('busyTimeout', BUSY_TIMEOUT_MS);
  }
}

export const sqliteDriver = { ...sqlite3, Database: BusyTolerantDatabase };
