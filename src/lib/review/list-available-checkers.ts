import 'server-only';
import { Op } from 'sequelize';
import { User, database } from '@/lib/db';

/** Active checkers a revision can be sent to: everyone with the checker role except its author. */
export async function listAvailableCheckers(authorId: string) {
  database();
  const checkers = await User.findAll({ where: { role: 'checker', status: 'active', id: { [Op.ne]: authorId } }, order: [['name', 'ASC']], attributes: ['id', 'name', 'organisation'] });
  return checkers.map((c) => ({ id: c.id, name: c.name, organisation: c.organisation }));
}
export type AvailableChecker = Awaited<ReturnType<typeof listAvailableCheckers>>[number];
