import 'server-only';
import { Op } from 'sequelize';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import { hashPassword } from '@/lib/auth/password';
import { Invitation, User, database } from '@/lib/db';
import { NotFoundError } from '@/lib/http/app-errors';
import type { AcceptInvitationInput } from '@/lib/validation/auth-schemas';
import { invitationTokenHash } from './invite-user';

/** Sets the invited user's password and activates the account; the link works once and expires. */
export async function acceptInvitation(input: AcceptInvitationInput) {
  const sequelize = database();
  const passwordHash = await hashPassword(input.password);
  return sequelize.transaction(async (transaction) => {
    const invitation = await Invitation.findOne({
      where: { tokenHash: invitationTokenHash(input.token), acceptedAt: null, cancelledAt: null, expiresAt: { [Op.gt]: new Date().toISOString() } },
      transaction,
    });
    if (!invitation) throw new NotFoundError('This invitation link is not valid any more. Ask an administrator for a new one.');
    const user = await User.findOne({ where: { email: invitation.email, status: 'invited' }, transaction });
    if (!user) throw new NotFoundError('This invitation link is not valid any more. Ask an administrator for a new one.');
    await user.update({ passwordHash, status: 'active', updatedAt: new Date().toISOString() }, { transaction });
    await invitation.update({ acceptedAt: new Date().toISOString() }, { transaction });
    await recordAuditEvent({ actorId: user.id, action: 'user.invitation-accepted', entityType: 'user', entityId: user.id }, transaction);
    return { email: user.email };
  });
}
