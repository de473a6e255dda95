import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

// The transactional outbox: an e-mail the portal owes someone is a row written in the same transaction as the
// decision it reports (submission, return, countersignature, revocation, invitation), so a crash can no longer keep
// the decision and lose the message. A deliverer claims rows (status 'sending' with a lease), hands them to SMTP and
// marks them delivered, or puts them back with a later next_attempt_at; a lease that runs out (the process died while
// sending) makes the row claimable again. Times used in arithmetic are milliseconds since 1970.
// The local SMTP server's own store (outbox_messages) gets a unique Message-ID, so a message sent twice because the
// sender died between the server's "accepted" and its own record is kept once.
const statements = [
  `CREATE TABLE outbound_messages (
    id TEXT PRIMARY KEY,
    message_id TEXT NOT NULL UNIQUE,
    purpose TEXT NOT NULL,
    recipient TEXT NOT NULL,
    subject TEXT NOT NULL,
    body_text TEXT NOT NULL,
    status TEXT NOT NULL DEFAULT 'pending' CHECK (status IN ('pending','sending','delivered','failed')),
    attempts INTEGER NOT NULL DEFAULT 0 CHECK (attempts >= 0),
    next_attempt_at INTEGER NOT NULL,
    lease_until INTEGER,
    claim_token TEXT,
    last_error TEXT,
    created_at TEXT NOT NULL,
    delivered_at TEXT
  )`,
  'CREATE INDEX outbound_messages_due ON outbound_messages (status, next_attempt_at)',
  'CREATE UNIQUE INDEX outbox_messages_message_id ON outbox_messages (message_id) WHERE message_id IS NOT NULL',
];

export const up: MigrationFn<QueryInterface> = async ({ context }) => {
  for (const sql of statements) await context.sequelize.query(sql);
};

export const down: MigrationFn<QueryInterface> = async ({ context }) => {
  await context.sequelize.query('DROP INDEX IF EXISTS outbox_messages_message_id');
  await context.sequelize.query('DROP TABLE IF EXISTS outbound_messages');
};
