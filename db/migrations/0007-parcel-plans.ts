import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

// The plan of a scheme's parcels: their outlines and the river centreline, stored per scheme (like the register, not
// per revision). Every upload is a new version; the file itself is kept in the plans folder beside the database by
// a name of ours (stored_name), and the checked geometry as JSON in the row, so drawing never re-reads the file.
// A register version made by restoring an earlier one records which (restored_from_version), so the history says so.
const statements = [
  `CREATE TABLE parcel_plans (
    id TEXT PRIMARY KEY,
    scheme_id TEXT NOT NULL REFERENCES schemes(id),
    version INTEGER NOT NULL CHECK (version >= 1),
    coordinate_system TEXT NOT NULL,
    geometry_json TEXT NOT NULL,
    source_format TEXT NOT NULL CHECK (source_format IN ('geojson','csv')),
    original_name TEXT NOT NULL,
    stored_name TEXT NOT NULL UNIQUE,
    sha256 TEXT NOT NULL,
    created_by TEXT REFERENCES users(id),
    created_at TEXT NOT NULL,
    UNIQUE (scheme_id, version)
  )`,
  'ALTER TABLE parcel_registers ADD COLUMN restored_from_version INTEGER CHECK (restored_from_version IS NULL OR restored_from_version >= 1)',
];

export const up: MigrationFn<QueryInterface> = async ({ context }) => {
  for (const sql of statements) await context.sequelize.query(sql);
};

export const down: MigrationFn<QueryInterface> = async ({ context }) => {
  await context.sequelize.query('ALTER TABLE parcel_registers DROP COLUMN restored_from_version');
  await context.sequelize.query('DROP TABLE IF EXISTS parcel_plans');
};
