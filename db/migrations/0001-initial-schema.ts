import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

// The whole mission's tables in one first migration, so later work adds behaviour, not rewrites.
// Timestamps are ISO-8601 text except sessions.expires_at, which Lucia's SQLite adapter keeps as Unix seconds.
const statements = [
  `CREATE TABLE users (
    id TEXT PRIMARY KEY,
    email TEXT NOT NULL UNIQUE COLLATE NOCASE,
    name TEXT NOT NULL,
    role TEXT NOT NULL CHECK (role IN ('designer','checker','liaison','planning','admin')),
    password_hash TEXT,
    status TEXT NOT NULL DEFAULT 'active' CHECK (status IN ('active','invited','disabled')),
    organisation TEXT,
    created_at TEXT NOT NULL,
    updated_at TEXT NOT NULL
  )`,
  `CREATE TABLE sessions (
    id TEXT PRIMARY KEY,
    user_id TEXT NOT NULL REFERENCES users(id) ON DELETE CASCADE,
    expires_at INTEGER NOT NULL,
    created_at TEXT
  )`,
  `CREATE INDEX sessions_user ON sessions(user_id)`,
  `CREATE TABLE invitations (
    id TEXT PRIMARY KEY,
    email TEXT NOT NULL COLLATE NOCASE,
    role TEXT NOT NULL CHECK (role IN ('designer','checker','liaison','planning','admin')),
    token_hash TEXT NOT NULL UNIQUE,
    invited_by TEXT NOT NULL REFERENCES users(id),
    expires_at TEXT NOT NULL,
    accepted_at TEXT,
    created_at TEXT NOT NULL
  )`,
  `CREATE TABLE schemes (
    id TEXT PRIMARY KEY,
    reference TEXT NOT NULL UNIQUE,
    name TEXT NOT NULL,
    watercourse TEXT NOT NULL,
    site TEXT NOT NULL,
    description TEXT,
    designer_id TEXT NOT NULL REFERENCES users(id),
    created_at TEXT NOT NULL,
    updated_at TEXT NOT NULL
  )`,
  `CREATE TABLE revisions (
    id TEXT PRIMARY KEY,
    scheme_id TEXT NOT NULL REFERENCES schemes(id),
    number INTEGER NOT NULL,
    status TEXT NOT NULL DEFAULT 'draft' CHECK (status IN ('draft','submitted','returned','countersigned','withdrawn')),
    wizard_step TEXT,
    inputs_json TEXT NOT NULL,
    results_json TEXT,
    inputs_sha256 TEXT,
    results_sha256 TEXT,
    revision_sha256 TEXT,
    engine_version TEXT,
    author_id TEXT NOT NULL REFERENCES users(id),
    checker_id TEXT REFERENCES users(id),
    based_on_revision_id TEXT REFERENCES revisions(id),
    submitted_at TEXT,
    countersigned_at TEXT,
    created_at TEXT NOT NULL,
    updated_at TEXT NOT NULL,
    UNIQUE (scheme_id, number),
    CHECK (checker_id IS NULL OR checker_id <> author_id)
  )`,
  `CREATE TABLE reviews (
    id TEXT PRIMARY KEY,
    revision_id TEXT NOT NULL REFERENCES revisions(id),
    checker_id TEXT NOT NULL REFERENCES users(id),
    decision TEXT CHECK (decision IN ('returned','countersigned')),
    summary TEXT,
    rerun_matches INTEGER,
    rerun_results_sha256 TEXT,
    decided_at TEXT,
    created_at TEXT NOT NULL
  )`,
  `CREATE TABLE review_comments (
    id TEXT PRIMARY KEY,
    review_id TEXT NOT NULL REFERENCES reviews(id),
    author_id TEXT NOT NULL REFERENCES users(id),
    part TEXT NOT NULL CHECK (part IN ('scheme','channel','flows','structure','limits','results')),
    body TEXT NOT NULL,
    created_at TEXT NOT NULL
  )`,
  `CREATE TABLE certificates (
    id TEXT PRIMARY KEY,
    number TEXT NOT NULL UNIQUE,
    scheme_id TEXT NOT NULL REFERENCES schemes(id),
    revision_id TEXT NOT NULL UNIQUE REFERENCES revisions(id),
    status TEXT NOT NULL DEFAULT 'issued' CHECK (status IN ('issued','superseded','revoked')),
    pdf_path TEXT NOT NULL,
    pdf_sha256 TEXT NOT NULL,
    signer_fingerprint TEXT NOT NULL,
    issued_at TEXT NOT NULL,
    superseded_by_id TEXT REFERENCES certificates(id),
    revoked_at TEXT,
    revoked_by TEXT REFERENCES users(id),
    revocation_reason TEXT
  )`,
  `CREATE TABLE uploads (
    id TEXT PRIMARY KEY,
    kind TEXT NOT NULL CHECK (kind IN ('survey-csv','parcels-csv','case-json','certificate-pdf')),
    original_name TEXT NOT NULL,
    stored_name TEXT NOT NULL UNIQUE,
    size_bytes INTEGER NOT NULL,
    sha256 TEXT NOT NULL,
    media_type TEXT NOT NULL,
    scheme_id TEXT REFERENCES schemes(id),
    uploaded_by TEXT NOT NULL REFERENCES users(id),
    created_at TEXT NOT NULL
  )`,
  `CREATE TABLE parcel_registers (
    id TEXT PRIMARY KEY,
    scheme_id TEXT NOT NULL REFERENCES schemes(id),
    version INTEGER NOT NULL,
    upload_id TEXT REFERENCES uploads(id),
    created_by TEXT NOT NULL REFERENCES users(id),
    note TEXT,
    created_at TEXT NOT NULL,
    UNIQUE (scheme_id, version)
  )`,
  `CREATE TABLE parcels (
    id TEXT PRIMARY KEY,
    register_id TEXT NOT NULL REFERENCES parcel_registers(id),
    scheme_id TEXT NOT NULL REFERENCES schemes(id),
    reference TEXT NOT NULL,
    owner_name TEXT NOT NULL,
    postal_address TEXT NOT NULL,
    email TEXT,
    distance_from_m REAL NOT NULL,
    distance_to_m REAL NOT NULL,
    bank_side TEXT NOT NULL CHECK (bank_side IN ('left','right','both')),
    ground_level_m REAL,
    land_use TEXT,
    created_at TEXT NOT NULL,
    UNIQUE (register_id, reference),
    CHECK (distance_to_m >= distance_from_m)
  )`,
  `CREATE TABLE letter_templates (
    id TEXT PRIMARY KEY,
    scheme_id TEXT REFERENCES schemes(id),
    version INTEGER NOT NULL,
    paragraphs_json TEXT NOT NULL,
    updated_by TEXT NOT NULL REFERENCES users(id),
    created_at TEXT NOT NULL
  )`,
  `CREATE TABLE letter_batches (
    id TEXT PRIMARY KEY,
    scheme_id TEXT NOT NULL REFERENCES schemes(id),
    revision_id TEXT NOT NULL REFERENCES revisions(id),
    created_by TEXT NOT NULL REFERENCES users(id),
    status TEXT NOT NULL DEFAULT 'open' CHECK (status IN ('open','sending','complete')),
    created_at TEXT NOT NULL
  )`,
  `CREATE TABLE letters (
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
    status TEXT NOT NULL DEFAULT 'queued' CHECK (status IN ('queued','sending','sent','failed','acknowledged')),
    failure_reason TEXT,
    message_id TEXT,
    sent_at TEXT,
    acknowledged_at TEXT,
    created_at TEXT NOT NULL,
    UNIQUE (parcel_id, revision_id, version)
  )`,
  `CREATE TABLE letter_responses (
    id TEXT PRIMARY KEY,
    letter_id TEXT NOT NULL REFERENCES letters(id),
    logged_by TEXT NOT NULL REFERENCES users(id),
    received_at TEXT NOT NULL,
    summary TEXT NOT NULL,
    created_at TEXT NOT NULL
  )`,
  `CREATE TABLE outbox_messages (
    id TEXT PRIMARY KEY,
    message_id TEXT,
    envelope_from TEXT NOT NULL,
    envelope_to TEXT NOT NULL,
    subject TEXT,
    raw_path TEXT NOT NULL,
    size_bytes INTEGER NOT NULL,
    received_at TEXT NOT NULL
  )`,
  `CREATE TABLE audit_events (
    id INTEGER PRIMARY KEY AUTOINCREMENT,
    at TEXT NOT NULL,
    actor_id TEXT REFERENCES users(id),
    action TEXT NOT NULL,
    entity_type TEXT NOT NULL,
    entity_id TEXT,
    scheme_id TEXT,
    details_json TEXT NOT NULL DEFAULT '{}',
    previous_hash TEXT NOT NULL,
    hash TEXT NOT NULL UNIQUE
  )`,
  `CREATE INDEX audit_events_scheme ON audit_events(scheme_id, at)`,
  `CREATE TRIGGER audit_events_no_update BEFORE UPDATE ON audit_events BEGIN SELECT RAISE(ABORT, 'the audit log is append-only'); END`,
  `CREATE TRIGGER audit_events_no_delete BEFORE DELETE ON audit_events BEGIN SELECT RAISE(ABORT, 'the audit log is append-only'); END`,
  `CREATE TRIGGER revisions_frozen BEFORE UPDATE OF inputs_json, results_json, inputs_sha256, results_sha256, revision_sha256, author_id ON revisions
     WHEN OLD.status IN ('submitted','countersigned') BEGIN SELECT RAISE(ABORT, 'a submitted revision is frozen'); END`,
];

const tables = ['audit_events', 'outbox_messages', 'letter_responses', 'letters', 'letter_batches', 'letter_templates', 'parcels', 'parcel_registers', 'uploads', 'certificates', 'review_comments', 'reviews', 'revisions', 'schemes', 'invitations', 'sessions', 'users'];

export const up: MigrationFn<QueryInterface> = async ({ context }) => {
  for (const sql of statements) await context.sequelize.query(sql);
};

export const down: MigrationFn<QueryInterface> = async ({ context }) => {
  for (const table of tables) await context.sequelize.query(`DROP TABLE IF EXISTS ${table}`);
};
