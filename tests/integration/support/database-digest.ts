import { createHash } from 'node:crypto';
import { database } from '@/lib/db';

/**
 * A hash of every row of every table. Row counts (tableSnapshot) miss an UPDATE; this does not, so a refused
 * request can be shown to have changed nothing at all.
 */
export async function databaseDigest(): Promise<string> {
  const sequelize = database();
  const [tables] = (await sequelize.query("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name")) as [{ name: string }[], unknown];
  const hash = createHash('sha256');
  for (const { name } of tables) {
    const [rows] = await sequelize.query(`SELECT * FROM "${name}" ORDER BY rowid`);
    hash.update(`${name}\u0000${JSON.stringify(rows)}\u0000`);
  }
  return hash.digest('hex');
}
