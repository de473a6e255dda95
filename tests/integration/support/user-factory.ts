import { randomUUID } from 'node:crypto';
import type { User as SessionUser } from 'lucia';
import { hashPassword } from '@/lib/auth/password';
import type { Role } from '@/lib/auth/roles';
import { User, database } from '@/lib/db';

/** A user of its own for each test, so tests never depend on one another or on the demo seed. */
export async function createTestUser(role: Role, overrides: { password?: string; status?: 'active' | 'invited' | 'disabled' } = {}) {
  database();
  const id = randomUUID();
  const password = overrides.password ?? `pw-${id}`;
  const user = await User.create({ id, email: `${role}-${id.slice(0, 8)}@example.test`, name: `Test ${role}`, role, passwordHash: await hashPassword(password), status: overrides.status ?? 'active', organisation: null });
  const sessionUser: SessionUser = { id, email: user.email, name: user.name, role, status: user.status };
  return { user, password, sessionUser };
}
