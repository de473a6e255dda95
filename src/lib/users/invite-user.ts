import 'server-only';
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { ROLE_LABELS } from '@/lib/auth/roles';
import { Invitation, User, database } from '@/lib/db';
import { ConflictError } from '@/lib/http/app-errors';
import { deliverOutboundMail } from '@/lib/mail/deliver-outbound-mail';
import { queueMail } from '@/lib/mail/queue-mail';
import type { InviteUserInput } from '@/lib/validation/auth-schemas';

export const INVITATION_DAYS = 7;

export function invitationTokenHash(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/** Creates an invited (not yet active) account and e-mails a one-time link; only the token's hash is stored. */
export async function inviteUser({ input, admin, baseUrl }: { input: InviteUserInput; admin: SessionUser; baseUrl: string }) {
  const sequelize = database();
  const token = randomBytes(32).toString('base64url');
  const invitation = await sequelize.transaction(async (transaction) => {
    const existing = await User.findOne({ where: { email: input.email }, transaction });
    // An account whose invitation was cancelled before anyone set its password never signed in: invite it afresh
    // (keeping its id, so its trail stays one person's) rather than refuse the address for ever.
    const neverUsed = existing !== null && existing.status === 'disabled' && existing.passwordHash === null;
    if (existing && !neverUsed) throw new ConflictError(`An account for ${input.email} exists already.`);
    const userId = existing?.id ?? randomUUID();
    if (existing) await existing.update({ name: input.name, role: input.role, status: 'invited', updatedAt: new Date().toISOString() }, { transaction });
    else await User.create({ id: userId, email: input.email, name: input.name, role: input.role, passwordHash: null, status: 'invited', organisation: null }, { transaction });
    const created = await Invitation.create(
      { id: randomUUID(), email: input.email, role: input.role, tokenHash: invitationTokenHash(token), invitedBy: admin.id, expiresAt: new Date(Date.now() + INVITATION_DAYS * 86400_000).toISOString(), acceptedAt: null },
      { transaction },
    );
    await recordAuditEvent({ actorId: admin.id, action: 'user.invited', entityType: 'user', entityId: userId, details: { email: input.email, role: input.role } }, transaction);
    const link = `${baseUrl}/invitation/${token}`;
    const text = `Hello ${input.name},\n\n${admin.name} has invited you to Sillmark as ${ROLE_LABELS[input.role]}.\nSet your password within ${INVITATION_DAYS} days here:\n\n${link}\n\nIf you did not expect this, ignore this message.\n`;
    const mail = await queueMail({ purpose: 'user.invited', messages: [{ to: input.email, subject: 'Your Sillmark account', text }] }, transaction);
    return { created, mail };
  });
  await deliverOutboundMail({ ids: invitation.mail });
  return { invitationId: invitation.created.id, email: input.email };
}
