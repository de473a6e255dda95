import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { lucia } from '@/lib/auth/lucia';
import { User, database } from '@/lib/db';
import { ConflictError, NotFoundError } from '@/lib/http/app-errors';
import type { ChangeRoleInput } from '@/lib/validation/auth-schemas';

/** Changes a user's role and ends their sessions, so the new role applies at their next sign-in. */
export async function changeUserRole({ input, admin }: { input: ChangeRoleInput; admin: SessionUser }) {
  const sequelize = database();
  const result = await sequelize.transaction(async (transaction) => {
    const user = await User.findByPk(input.userId, { transaction });
    if (!user) throw new NotFoundError('No such user.');
    if (user.id === admin.id && input.role !== 'admin') throw new ConflictError('You cannot remove your own administrator role; ask another administrator.');
    const previousRole = user.role;
    await user.update({ role: input.role, updatedAt: new Date().toISOString() }, { transaction });
    await recordAuditEvent({ actorId: admin.id, action: 'user.role-changed', entityType: 'user', entityId: user.id, details: { from: previousRole, to: input.role } }, transaction);
    return { userId: user.id, role: input.role, previousRole };
  });
  if (result.previousRole !== result.role) await lucia().invalidateUserSessions(result.userId);
  return result;
}
