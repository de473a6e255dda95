import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

// Failed password attempts, counted per scope (account and client together, account alone, client alone, countersigning).
// Kept in SQLite so that a restart does not clear them and every server process counts the same attempts.
// The key is a SHA-256 of the scope and its subject: a mistyped e-mail field may hold a password, so it is never stored.
// Times are milliseconds since 1970, because the throttle does arithmetic on them.
const statements = [
  `CREATE TABLE sign_in_attempts (
    key TEXT PRIMARY KEY,
    scope TEXT NOT NULL CHECK (scope IN ('account-client','account','client','countersign')),
    failures INTEGER NOT NULL CHECK (failures >= 0),
    window_started_at INTEGER NOT NULL,
    last_failure_at INTEGER NOT NULL
  )`,
];

export const up: MigrationFn<QueryInterface> = async ({ context }) => {
  for (const sql of statements) await context.sequelize.query(sql);
};

export const down: MigrationFn<QueryInterface> = async ({ context }) => {
  await context.sequelize.query('DROP TABLE IF EXISTS sign_in_attempts');
};
