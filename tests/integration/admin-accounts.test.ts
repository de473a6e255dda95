import { readFile } from 'node:fs/promises';
import { simpleParser } from 'mailparser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cancelInvitationAction, resendInvitationAction, setUserActiveAction } from '@/app/(portal)/admin/users/actions';
import InvitationPage from '@/app/(auth)/invitation/[token]/page';
import { lucia } from '@/lib/auth/lucia';
import { signIn } from '@/lib/auth/sign-in';
import { Invitation, OutboxMessage, User, database } from '@/lib/db';
import { acceptInvitation } from '@/lib/users/accept-invitation';
import { inviteUser } from '@/lib/users/invite-user';
import { invitationStanding } from '@/lib/users/manage-invitation';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let admin: Awaited<ReturnType<typeof createTestUser>>;
beforeAll(async () => {
  db = await useTestDatabase();
  admin = await createTestUser('admin');
  signedInAs(admin.sessionUser);
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

async function tokensFor(to: string): Promise<string[]> {
  database();
  const messages = await OutboxMessage.findAll({ where: { envelopeTo: to }, order: [['receivedAt', 'ASC']] });
  return Promise.all(messages.map(async (m) => /\/invitation\/([A-Za-z0-9_-]+)/.exec((await simpleParser(await readFile(m.rawPath))).text ?? '')![1]));
}
const pageText = async (token: string) => JSON.stringify(await InvitationPage({ params: Promise.resolve({ token }) }));

describe('deactivating a user', () => {
  it('ends their sessions and refuses their sign-in, keeps the account, and reactivating lets them in again', async () => {
    const designer = await createTestUser('designer');
    const { session } = await signIn({ email: designer.user.email, password: designer.password, clientAddress: '192.0.2.20' });
    expect(await setUserActiveAction({ userId: designer.user.id, active: false })).toMatchObject({ ok: true, data: { status: 'disabled' } });
    expect((await lucia().validateSession(session.id)).session).toBeNull();
    await expect(signIn({ email: designer.user.email, password: designer.password, clientAddress: '192.0.2.20' })).rejects.toMatchObject({ name: 'InvalidCredentialsError' });
    expect(await User.findByPk(designer.user.id)).not.toBeNull();
    expect(await setUserActiveAction({ userId: designer.user.id, active: true })).toMatchObject({ ok: true, data: { status: 'active' } });
    expect((await signIn({ email: designer.user.email, password: designer.password, clientAddress: '192.0.2.21' })).user.id).toBe(designer.user.id);
  });

  it('refuses an administrator deactivating themselves', async () => {
    expect(await setUserActiveAction({ userId: admin.user.id, active: false })).toMatchObject({ ok: false, error: expect.stringMatching(/your own account/) });
  });
});

describe('invitations', () => {
  it('say on their page whose account they set up; a resent one replaces the old link; a used, cancelled or unknown link is refused before any form', async () => {
    await inviteUser({ input: { email: 'ferne.oakes@wendle-valley.test', name: 'Ferne Oakes', role: 'checker' }, admin: admin.sessionUser, baseUrl: 'http://localhost:3000' });
    const [first] = await tokensFor('ferne.oakes@wendle-valley.test');
    expect(await pageText(first)).toContain('Ferne Oakes');
    const invitation = (await Invitation.findOne({ where: { email: 'ferne.oakes@wendle-valley.test' } }))!;
    expect(await resendInvitationAction({ invitationId: invitation.id })).toMatchObject({ ok: true });
    const tokens = await tokensFor('ferne.oakes@wendle-valley.test');
    expect(tokens).toHaveLength(2);
    const second = tokens.find((t) => t !== first)!;
    expect(await invitationStanding(first)).toEqual({ ok: false, reason: 'unknown' });
    expect(await invitationStanding(second)).toMatchObject({ ok: true, name: 'Ferne Oakes', role: 'Checker' });
    await acceptInvitation({ token: second, password: 'a-long-new-password', confirmPassword: 'a-long-new-password' });
    const used = await pageText(second);
    expect(used).toContain('used already');
    expect(used).not.toContain('New password');
    expect(await pageText('x'.repeat(40))).toContain('not one the portal knows');
  });

  it('can be cancelled, after which the link is refused', async () => {
    await inviteUser({ input: { email: 'otto.brack@wendle-valley.test', name: 'Otto Brack', role: 'designer' }, admin: admin.sessionUser, baseUrl: 'http://localhost:3000' });
    const [token] = await tokensFor('otto.brack@wendle-valley.test');
    const invitation = (await Invitation.findOne({ where: { email: 'otto.brack@wendle-valley.test' } }))!;
    expect(await cancelInvitationAction({ invitationId: invitation.id })).toMatchObject({ ok: true });
    expect(await invitationStanding(token)).toEqual({ ok: false, reason: 'cancelled' });
    await expect(acceptInvitation({ token, password: 'a-long-new-password', confirmPassword: 'a-long-new-password' })).rejects.toMatchObject({ status: 404 });
    expect(await cancelInvitationAction({ invitationId: invitation.id })).toMatchObject({ ok: false, error: expect.stringMatching(/cancelled/) });
  });

  it('can be sent again to an address whose invitation was cancelled: the same account, a new link that works, the old one still refused', async () => {
    const email = 'nell.ashby@wendle-valley.test';
    await inviteUser({ input: { email, name: 'Nell Ashby', role: 'designer' }, admin: admin.sessionUser, baseUrl: 'http://localhost:3000' });
    const first = (await Invitation.findOne({ where: { email } }))!;
    const accountId = (await User.findOne({ where: { email } }))!.id;
    expect(await cancelInvitationAction({ invitationId: first.id })).toMatchObject({ ok: true });
    await inviteUser({ input: { email, name: 'Nell Ashby', role: 'checker' }, admin: admin.sessionUser, baseUrl: 'http://localhost:3000' });
    const [oldToken, newToken] = await tokensFor(email);
    expect(await invitationStanding(oldToken)).toEqual({ ok: false, reason: 'cancelled' });
    expect(await invitationStanding(newToken)).toMatchObject({ ok: true, email });
    await acceptInvitation({ token: newToken, password: 'a-long-new-password', confirmPassword: 'a-long-new-password' });
    const account = (await User.findOne({ where: { email } }))!;
    expect({ id: account.id, role: account.role, status: account.status }).toEqual({ id: accountId, role: 'checker', status: 'active' });
  });

  it('still refuses an address whose account was used, even when it is deactivated', async () => {
    const designer = await createTestUser('designer');
    expect(await setUserActiveAction({ userId: designer.user.id, active: false })).toMatchObject({ ok: true });
    await expect(inviteUser({ input: { email: designer.user.email, name: 'Someone Else', role: 'designer' }, admin: admin.sessionUser, baseUrl: 'http://localhost:3000' })).rejects.toMatchObject({ status: 409 });
  });
});
