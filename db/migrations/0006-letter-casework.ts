import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

// Landowner casework. A batch can be withdrawn before anything of it leaves; a letter to a parcel without an e-mail
// address is "to post" (then "posted", with the day) rather than failed; a withdrawn batch's letters are "withdrawn".
// Each letter carries the day its response is due. A response has a type and a channel and keeps its earlier wordings
// in letter_response_edits. Reminders are their own rows. Templates say how many days a landowner has to respond.
// SQLite cannot change a CHECK constraint in place, so letter_batches and letters are rebuilt by the procedure in
// https://www.sqlite.org/lang_altertable.html ("Making Other Kinds Of Table Schema Changes"), foreign keys off.

const LETTER_COLUMNS = (statuses: string, extra: string) => `(
    id TEXT PRIMARY KEY,
    batch_id TEXT REFERENCES letter_batches(id),
    parcel_id TEXT NOT NULL REFERENCES parcels(id),
    revision_id TEXT NOT NULL REFERENCES revisions(id),
    template_id TEXT REFERENCES letter_templates(id),
    version INTEGER NOT NULL,
    preliminary INTEGER NOT NULL DEFAULT 0,
    category TEXT NOT NULL,
    impact_json TEXT NOT NULL,
    pdf_path TEXT,
    pdf_sha256 TEXT,
    recipient_email TEXT,
    status TEXT NOT NULL DEFAULT 'queued' CHECK (status IN (${statuses})),
    failure_reason TEXT,
    message_id TEXT,
    sent_at TEXT,
    acknowledged_at TEXT,
    created_at TEXT NOT NULL,${extra}
    UNIQUE (parcel_id, revision_id, version)
  )`;
const BATCH_COLUMNS = (statuses: string) => `(
    id TEXT PRIMARY KEY,
    scheme_id TEXT NOT NULL REFERENCES schemes(id),
    revision_id TEXT NOT NULL REFERENCES revisions(id),
    created_by TEXT NOT NULL REFERENCES users(id),
    status TEXT NOT NULL DEFAULT 'open' CHECK (status IN (${statuses})),
    created_at TEXT NOT NULL
  )`;

const OLD_LETTER = "'queued','sending','sent','failed','acknowledged','held'";
const NEW_LETTER = `${OLD_LETTER},'to-post','posted','withdrawn'`;
// document_json keeps what the PDF was rendered from, so letters to post can be printed again together, unchanged.
const NEW_EXTRA = `
    response_due_on TEXT,
    posted_on TEXT,
    document_json TEXT,`;
const OLD_COPY = 'id, batch_id, parcel_id, revision_id, template_id, version, preliminary, category, impact_json, pdf_path, pdf_sha256, recipient_email, status, failure_reason, message_id, sent_at, acknowledged_at, created_at';

async function rebuild(context: QueryInterface, steps: string[]): Promise<void> {
  const run = (sql: string) => context.sequelize.query(sql);
  await run('PRAGMA foreign_keys = OFF');
  try {
    await run('BEGIN IMMEDIATE');
    try {
      for (const sql of steps) await run(sql);
      const [broken] = await context.sequelize.query('PRAGMA foreign_key_check');
      if ((broken as unknown[]).length > 0) throw new Error('rebuilding the letters tables broke a foreign key');
      await run('COMMIT');
    } catch (error) {
      await run('ROLLBACK');
      throw error;
    }
  } finally {
    await run('PRAGMA foreign_keys = ON');
  }
}

const swap = (table: string, columns: string, copyInto: string, copyFrom: string) => [
  `CREATE TABLE ${table}_rebuilt ${columns}`,
  `INSERT INTO ${table}_rebuilt (${copyInto}) SELECT ${copyFrom} FROM ${table}`,
  `DROP TABLE ${table}`,
  `ALTER TABLE ${table}_rebuilt RENAME TO ${table}`,
];

export const up: MigrationFn<QueryInterface> = async ({ context }) => {
  await rebuild(context, [
    ...swap('letter_batches', BATCH_COLUMNS("'open','sending','complete','withdrawn'"), 'id, scheme_id, revision_id, created_by, status, created_at', 'id, scheme_id, revision_id, created_by, status, created_at'),
    ...swap('letters', LETTER_COLUMNS(NEW_LETTER, NEW_EXTRA), OLD_COPY, OLD_COPY),
    `CREATE TABLE letter_response_edits (
      id TEXT PRIMARY KEY,
      response_id TEXT NOT NULL REFERENCES letter_responses(id),
      edited_by TEXT NOT NULL REFERENCES users(id),
      previous_json TEXT NOT NULL,
      created_at TEXT NOT NULL
    )`,
    `CREATE TABLE letter_reminders (
      id TEXT PRIMARY KEY,
      letter_id TEXT NOT NULL REFERENCES letters(id),
      channel TEXT NOT NULL CHECK (channel IN ('email','post')),
      outbound_message_id TEXT REFERENCES outbound_messages(id),
      created_by TEXT NOT NULL REFERENCES users(id),
      posted_on TEXT,
      created_at TEXT NOT NULL
    )`,
    "ALTER TABLE letter_responses ADD COLUMN response_type TEXT NOT NULL DEFAULT 'other' CHECK (response_type IN ('no-objection','objection','question','other'))",
    "ALTER TABLE letter_responses ADD COLUMN channel TEXT NOT NULL DEFAULT 'email' CHECK (channel IN ('email','post','telephone','meeting'))",
    'ALTER TABLE letter_templates ADD COLUMN response_days INTEGER NOT NULL DEFAULT 28 CHECK (response_days BETWEEN 7 AND 90)',
    'ALTER TABLE invitations ADD COLUMN cancelled_at TEXT',
    'CREATE INDEX letters_due ON letters (status, response_due_on)',
  ]);
};

// Going back, letters to post or posted become failed (as before), withdrawn ones failed with the reason; a withdrawn batch is complete.
export const down: MigrationFn<QueryInterface> = async ({ context }) => {
  const status = "CASE status WHEN 'to-post' THEN 'failed' WHEN 'posted' THEN 'sent' WHEN 'withdrawn' THEN 'failed' ELSE status END";
  const reason = "CASE status WHEN 'withdrawn' THEN 'Withdrawn before sending.' WHEN 'to-post' THEN 'No e-mail address in the parcels register: print the PDF and post it.' ELSE failure_reason END";
  const sentAt = "CASE status WHEN 'posted' THEN posted_on || 'T00:00:00.000Z' ELSE sent_at END";
  const from = OLD_COPY.replace('status, failure_reason', `${status}, ${reason}`).replace('sent_at', sentAt);
  await rebuild(context, [
    'DROP INDEX IF EXISTS letters_due',
    'DROP TABLE letter_reminders',
    'DROP TABLE letter_response_edits',
    'ALTER TABLE letter_responses DROP COLUMN response_type',
    'ALTER TABLE letter_responses DROP COLUMN channel',
    'ALTER TABLE letter_templates DROP COLUMN response_days',
    'ALTER TABLE invitations DROP COLUMN cancelled_at',
    ...swap('letters', LETTER_COLUMNS(OLD_LETTER, ''), OLD_COPY, from),
    ...swap('letter_batches', BATCH_COLUMNS("'open','sending','complete'"), 'id, scheme_id, revision_id, created_by, status, created_at', "id, scheme_id, revision_id, created_by, CASE status WHEN 'withdrawn' THEN 'complete' ELSE status END, created_at"),
  ]);
};
