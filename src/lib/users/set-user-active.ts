import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { lucia } from '@/lib/auth/lucia';
import { User, database } from '@/lib/db';
import { ConflictError, NotFoundError } from '@/lib/http/app-errors';
import type { SetUserActiveInput } from '@/lib/validation/auth-schemas';

/**
 * Deactivates an account (its sessions end at once and it can no longer sign in) or reactivates it. Nothing the
 * person did is removed: their schemes, checks, letters and audit events keep naming them.
 */
export async function setUserActive({ input, admin }: { input: SetUserActiveInput; admin: SessionUser }) {
  const result = await database().transaction(async (transaction) => {
    const user = await User.findByPk(input.userId, { transaction });
    if (!user) throw new NotFoundError('No such user.');
    if (user.id === admin.id) throw new ConflictError('You cannot deactivate your own account; ask another administrator.');
    if (user.status === 'invited') throw new ConflictError(`${user.name} has not accepted the invitation yet: cancel the invitation instead.`);
    const target = input.active ? 'active' : 'disabled';
    if (user.status === target) throw new ConflictError(`${user.name}’s account is ${input.active ? 'active' : 'deactivated'} already.`);
    await user.update({ status: target, updatedAt: new Date().toISOString() }, { transaction });
    await recordAuditEvent({ actorId: admin.id, action: input.active ? 'user.reactivated' : 'user.deactivated', entityType: 'user', entityId: user.id }, transaction);
    return { userId: user.id, name: user.name, status: target };
  });
  if (result.status === 'disabled') await lucia().invalidateUserSessions(result.userId);
  return result;
}
