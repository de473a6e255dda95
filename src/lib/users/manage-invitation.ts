import 'server-only';
import { randomBytes } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { ROLE_LABELS } from '@/lib/auth/roles';
import { Invitation, User, database } from '@/lib/db';
import { ConflictError, NotFoundError } from '@/lib/http/app-errors';
import { deliverOutboundMail } from '@/lib/mail/deliver-outbound-mail';
import { queueMail } from '@/lib/mail/queue-mail';
import { INVITATION_DAYS, invitationTokenHash } from './invite-user';

async function openInvitation(invitationId: string, transaction: Transaction) {
  const invitation = await Invitation.findByPk(invitationId, { transaction });
  if (!invitation) throw new NotFoundError('No such invitation.');
  if (invitation.acceptedAt) throw new ConflictError(`${invitation.email} accepted this invitation already.`);
  if (invitation.cancelledAt) throw new ConflictError(`The invitation to ${invitation.email} was cancelled.`);
  const user = await User.findOne({ where: { email: invitation.email, status: 'invited' }, transaction });
  if (!user) throw new ConflictError(`There is no account waiting for ${invitation.email}.`);
  return { invitation, user };
}

/** Sends a new link (the old one stops working) valid for another INVITATION_DAYS days. */
export async function resendInvitation({ invitationId, admin, baseUrl }: { invitationId: string; admin: SessionUser; baseUrl: string }) {
  const token = randomBytes(32).toString('base64url');
  const done = await database().transaction(async (transaction) => {
    const { invitation, user } = await openInvitation(invitationId, transaction);
    await invitation.update({ tokenHash: invitationTokenHash(token), expiresAt: new Date(Date.now() + INVITATION_DAYS * 86400_000).toISOString() }, { transaction });
    await recordAuditEvent({ actorId: admin.id, action: 'user.invitation-resent', entityType: 'user', entityId: user.id, details: { email: invitation.email } }, transaction);
    const text = `Hello ${user.name},\n\n${admin.name} has sent you a new link to set up your Sillmark account as ${ROLE_LABELS[user.role]}; any earlier link no longer works.\nSet your password within ${INVITATION_DAYS} days here:\n\n${baseUrl}/invitation/${token}\n\nIf you did not expect this, ignore this message.\n`;
    return queueMail({ purpose: 'user.invited', messages: [{ to: invitation.email, subject: 'Your Sillmark account: a new link', text }] }, transaction);
  });
  await deliverOutboundMail({ ids: done });
  return { invitationId };
}

/** Cancels an invitation: its link stops working and the waiting account, which never signed in, is deactivated. */
export async function cancelInvitation({ invitationId, admin }: { invitationId: string; admin: SessionUser }) {
  return database().transaction(async (transaction) => {
    const { invitation, user } = await openInvitation(invitationId, transaction);
    await invitation.update({ cancelledAt: new Date().toISOString() }, { transaction });
    await user.update({ status: 'disabled', updatedAt: new Date().toISOString() }, { transaction });
    await recordAuditEvent({ actorId: admin.id, action: 'user.invitation-cancelled', entityType: 'user', entityId: user.id, details: { email: invitation.email } }, transaction);
    return { invitationId, email: invitation.email };
  });
}

export type InvitationStanding = { ok: true; name: string; email: string; role: string } | { ok: false; reason: 'unknown' | 'used' | 'expired' | 'cancelled' };

/** What an invitation link is, read when its page opens: whose account it sets up, or why it no longer works. */
export async function invitationStanding(token: string): Promise<InvitationStanding> {
  database();
  const invitation = await Invitation.findOne({ where: { tokenHash: invitationTokenHash(token) } });
  if (!invitation) return { ok: false, reason: 'unknown' };
  if (invitation.acceptedAt) return { ok: false, reason: 'used' };
  if (invitation.cancelledAt) return { ok: false, reason: 'cancelled' };
  if (invitation.expiresAt <= new Date().toISOString()) return { ok: false, reason: 'expired' };
  const user = await User.findOne({ where: { email: invitation.email, status: 'invited' } });
  if (!user) return { ok: false, reason: 'used' };
  return { ok: true, name: user.name, email: user.email, role: ROLE_LABELS[user.role] };
}

