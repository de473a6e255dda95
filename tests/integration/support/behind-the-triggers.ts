import { database } from '@/lib/db';
import { migrator } from '@/lib/db/migrator';

/**
 * Runs raw SQL against a frozen revision as only someone with the database file could: the trigger that guards the
 * frozen fields is dropped for it, then migration 0002 is run down and up again, which puts every trigger back as shipped.
 */
export async function behindTheTriggers(sql: string, replacements: Record<string, unknown> | unknown[]): Promise<void> {
  const sequelize = database();
  await sequelize.query('DROP TRIGGER revisions_frozen_fields');
  try {
    await sequelize.query(sql, { replacements });
  } finally {
    await migrator().down({ to: '0002-frozen-revisions' });
    await migrator().up();
  }
}

/** The names of the triggers on the revisions table, to prove they are back. */
export async function revisionTriggers(): Promise<string[]> {
  const [rows] = (await database().query("SELECT name FROM sqlite_master WHERE type = 'trigger' AND tbl_name = 'revisions' ORDER BY name")) as [{ name: string }[], unknown];
  return rows.map((r) => r.name);
}
