import { readFile } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signIn } from '@/lib/auth/sign-in';
import { OutboxMessage, User, database } from '@/lib/db';
import { acceptInvitation } from '@/lib/users/accept-invitation';
import { changeUserRole } from '@/lib/users/change-user-role';
import { inviteUser } from '@/lib/users/invite-user';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
beforeAll(async () => (db = await useTestDatabase()));
afterAll(async () => db.cleanup());

async function tokenFromOutbox(to: string): Promise<string> {
  database();
  const message = await OutboxMessage.findOne({ where: { envelopeTo: to } });
  const raw = await readFile(message!.rawPath, 'utf8');
  return /\/invitation\/([A-Za-z0-9_-]+)/.exec(raw)![1];
}

describe('admin invites a user by e-mail', () => {
  it('creates an invited account, mails a one-time link to the outbox, and the link activates the account once', async () => {
    const admin = (await createTestUser('admin')).sessionUser;
    await inviteUser({ input: { email: 'new.checker@example.test', name: 'New Checker', role: 'checker' }, admin, baseUrl: 'http://localhost:3000' });
    expect((await User.findOne({ where: { email: 'new.checker@example.test' } }))?.status).toBe('invited');
    const token = await tokenFromOutbox('new.checker@example.test');
    await acceptInvitation({ token, password: 'a-long-new-password', confirmPassword: 'a-long-new-password' });
    const { user } = await signIn({ email: 'new.checker@example.test', password: 'a-long-new-password', clientAddress: '192.0.2.10' });
    expect(user.role).toBe('checker');
    const before = await tableSnapshot();
    await expect(acceptInvitation({ token, password: 'another-password', confirmPassword: 'another-password' })).rejects.toMatchObject({ status: 404 });
    expect(await tableSnapshot()).toEqual(before);
  });

  it('refuses to invite an address that already has an account, storing nothing', async () => {
    const admin = (await createTestUser('admin')).sessionUser;
    const existing = await createTestUser('liaison');
    const before = await tableSnapshot();
    await expect(inviteUser({ input: { email: existing.user.email, name: 'Dup', role: 'liaison' }, admin, baseUrl: 'http://x' })).rejects.toMatchObject({ status: 409 });
    expect(await tableSnapshot()).toEqual(before);
  });

  it('changes a role and records it in the audit trail; an admin cannot demote themself', async () => {
    const admin = (await createTestUser('admin')).sessionUser;
    const target = await createTestUser('designer');
    await changeUserRole({ input: { userId: target.user.id, role: 'checker' }, admin });
    expect((await User.findByPk(target.user.id))?.role).toBe('checker');
    await expect(changeUserRole({ input: { userId: admin.id, role: 'designer' }, admin })).rejects.toMatchObject({ status: 409 });
  });
});
