import 'server-only';
import { Invitation, User, database } from '@/lib/db';

/** Users as the admin pages show them: never the password hash. */
export async function listUsers() {
  database();
  const users = await User.findAll({ order: [['role', 'ASC'], ['name', 'ASC']] });
  return users.map((u) => ({ id: u.id, email: u.email, name: u.name, role: u.role, status: u.status, createdAt: u.createdAt }));
}
export type ListedUser = Awaited<ReturnType<typeof listUsers>>[number];

/** Invitations still waiting to be accepted (expired ones too, so they can be resent). */
export async function listPendingInvitations() {
  database();
  const invitations = await Invitation.findAll({ where: { acceptedAt: null, cancelledAt: null }, order: [['createdAt', 'DESC']] });
  const names = new Map((await User.findAll({ where: { email: invitations.map((i) => i.email), status: 'invited' } })).map((u) => [u.email.toLowerCase(), u.name]));
  const now = new Date().toISOString();
  return invitations.filter((i) => names.has(i.email.toLowerCase())).map((i) => ({ id: i.id, email: i.email, name: names.get(i.email.toLowerCase()) ?? i.email, role: i.role, expiresAt: i.expiresAt, expired: i.expiresAt <= now }));
}
