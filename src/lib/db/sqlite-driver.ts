import sqlite3 from 'sqlite3';

// node-sqlite3 waits for a lock inside a libuv worker thread; a long wait there can starve the thread pool that the
// lock's holder needs to finish. So each wait is short, and Sequelize retries SQLITE_BUSY with back-off in JavaScript
// (see sequelize.ts), which waits without holding a thread.
export const BUSY_TIMEOUT_MS = 200;

// Sequelize's SQLite dialect opens a new connection per transaction and offers no connect hook,
// so the busy timeout is set in the driver's constructor.
class BusyTolerantDatabase extends sqlite3.Database {
  constructor(filename: string, mode?: number, callback?: (err: Error | null) => void) {
    super(filename, mode ?? sqlite3.OPEN_READWRITE | sqlite3.OPEN_CREATE, callback);
    this.configure('busyTimeout', BUSY_TIMEOUT_MS);
  }
}

export const sqliteDriver = { ...sqlite3, Database: BusyTolerantDatabase };
