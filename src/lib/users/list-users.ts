import 'server-only';
import { User, database } from '@/lib/db';

/** Users as the admin pages show them: never the password hash. */
export async function listUsers() {
  database();
  const users = await User.findAll({ order: [['role', 'ASC'], ['name', 'ASC']] });
  return users.map((u) => ({ id: u.id, email: u.email, name: u.name, role: u.role, status: u.status, createdAt: u.createdAt }));
}
export type ListedUser = Awaited<ReturnType<typeof listUsers>>[number];
