import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

// A letter of a revision whose certificate is revoked is "held": kept, never sent. SQLite cannot change a CHECK
// constraint in place, so the table is rebuilt by the procedure in https://www.sqlite.org/lang_altertable.html
// ("Making Other Kinds Of Table Schema Changes"), with foreign keys off so letter_responses keeps its references.
const columns = (statuses: string) => `(
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
    created_at TEXT NOT NULL,
    UNIQUE (parcel_id, revision_id, version)
  )`;

const WITH_HELD = "'queued','sending','sent','failed','acknowledged','held'";
const WITHOUT_HELD = "'queued','sending','sent','failed','acknowledged'";

async function rebuildLetters(context: QueryInterface, statuses: string, copy: string): Promise<void> {
  const run = (sql: string) => context.sequelize.query(sql);
  await run('PRAGMA foreign_keys = OFF');
  try {
    await run('BEGIN IMMEDIATE');
    try {
      await run(`CREATE TABLE letters_rebuilt ${columns(statuses)}`);
      await run(`INSERT INTO letters_rebuilt SELECT ${copy} FROM letters`);
      await run('DROP TABLE letters');
      await run('ALTER TABLE letters_rebuilt RENAME TO letters');
      const [broken] = await context.sequelize.query('PRAGMA foreign_key_check');
      if ((broken as unknown[]).length > 0) throw new Error('rebuilding the letters table broke a foreign key');
      await run('COMMIT');
    } catch (error) {
      await run('ROLLBACK');
      throw error;
    }
  } finally {
    await run('PRAGMA foreign_keys = ON');
  }
}

const COLUMNS = 'id, batch_id, parcel_id, revision_id, template_id, version, preliminary, category, impact_json, pdf_path, pdf_sha256, recipient_email, status, failure_reason, message_id, sent_at, acknowledged_at, created_at';

export const up: MigrationFn<QueryInterface> = async ({ context }) => {
  await rebuildLetters(context, WITH_HELD, COLUMNS);
};

// Going back, a held letter becomes failed with the reason, so it is still not sent on its own.
export const down: MigrationFn<QueryInterface> = async ({ context }) => {
  const copy = COLUMNS.replace('status, failure_reason', "CASE status WHEN 'held' THEN 'failed' ELSE status END, CASE status WHEN 'held' THEN 'Held: the certificate of its revision was revoked.' ELSE failure_reason END");
  await rebuildLetters(context, WITHOUT_HELD, copy);
};
