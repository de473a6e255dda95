import type { QueryInterface } from 'sequelize';
import type { MigrationFn } from 'umzug';

// Once a revision leaves draft (submitted, returned, countersigned, withdrawn) its record is fixed for ever, so that
// it keeps matching its own SHA-256 values whatever code or hand-written SQL runs against the file. 0001's trigger
// covered submitted and countersigned revisions only and left returned ones open to change.
const FROZEN_COLUMNS = ['inputs_json', 'results_json', 'inputs_sha256', 'results_sha256', 'revision_sha256', 'engine_version', 'scheme_id', 'number', 'author_id', 'submitted_at', 'based_on_revision_id'];

const upStatements = [
  `DROP TRIGGER IF EXISTS revisions_frozen`,
  `CREATE TRIGGER revisions_frozen_fields BEFORE UPDATE OF ${FROZEN_COLUMNS.join(', ')} ON revisions
     WHEN OLD.status <> 'draft' BEGIN SELECT RAISE(ABORT, 'a revision that left draft is frozen: its inputs, results, hashes and engine version cannot change'); END`,
  `CREATE TRIGGER revisions_frozen_status BEFORE UPDATE OF status ON revisions
     WHEN OLD.status <> 'draft' AND NEW.status = 'draft' BEGIN SELECT RAISE(ABORT, 'a revision that left draft cannot become a draft again'); END`,
  `CREATE TRIGGER revisions_frozen_no_delete BEFORE DELETE ON revisions
     WHEN OLD.status <> 'draft' BEGIN SELECT RAISE(ABORT, 'a revision that left draft is frozen and cannot be deleted'); END`,
];

const downStatements = [
  `DROP TRIGGER IF EXISTS revisions_frozen_fields`,
  `DROP TRIGGER IF EXISTS revisions_frozen_status`,
  `DROP TRIGGER IF EXISTS revisions_frozen_no_delete`,
  `CREATE TRIGGER revisions_frozen BEFORE UPDATE OF inputs_json, results_json, inputs_sha256, results_sha256, revision_sha256, author_id ON revisions
     WHEN OLD.status IN ('submitted','countersigned') BEGIN SELECT RAISE(ABORT, 'a submitted revision is frozen'); END`,
];

export const up: MigrationFn<QueryInterface> = async ({ context }) => {
  for (const sql of upStatements) await context.sequelize.query(sql);
};

export const down: MigrationFn<QueryInterface> = async ({ context }) => {
  for (const sql of downStatements) await context.sequelize.query(sql);
};
