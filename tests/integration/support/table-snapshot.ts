import { database } from '@/lib/db';

/** Row counts of every table, to prove that a refused request stored nothing. */
export async function tableSnapshot(): Promise<Record<string, number>> {
  const sequelize = database();
  const [tables] = (await sequelize.query("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name")) as [{ name: string }[], unknown];
  const counts: Record<string, number> = {};
  for (const { name } of tables) {
    const [[row]] = (await sequelize.query(`SELECT COUNT(*) AS n FROM "${name}"`)) as [{ n: number }[], unknown];
    counts[name] = row.n;
  }
  return counts;
}
