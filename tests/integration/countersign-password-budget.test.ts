import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { countersignRevisionAction } from '@/app/(portal)/checks/[id]/actions';
import { submitForCheckAction } from '@/app/(portal)/revisions/[id]/actions';
import { signIn } from '@/lib/auth/sign-in';
import { AuditEvent, Revision } from '@/lib/db';
import { createTestScheme } from './support/scheme-factory';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

type Person = Awaited<ReturnType<typeof createTestUser>>;
let db: Awaited<ReturnType<typeof useTestDatabase>>;
let designer: Person;
beforeAll(async () => {
  db = await useTestDatabase();
  designer = await createTestUser('designer');
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

async function submittedFor(checker: Person) {
  const { revision } = await createTestScheme(designer.user.id);
  signedInAs(designer.sessionUser);
  expect((await submitForCheckAction({ revisionId: revision.id, checkerId: checker.user.id })).ok).toBe(true);
  signedInAs(checker.sessionUser);
  return revision;
}

describe('re-entering the password to countersign has its own budget', () => {
  it('is not used up by a stranger’s wrong sign-ins for the checker’s address', async () => {
    const checker = await createTestUser('checker');
    for (let i = 0; i < 5; i++) await expect(signIn({ email: checker.user.email, password: `guess-${i}`, clientAddress: '203.0.113.66' })).rejects.toMatchObject({ status: 401 });
    await expect(signIn({ email: checker.user.email, password: checker.password, clientAddress: '203.0.113.66' })).rejects.toMatchObject({ status: 429 });
    const revision = await submittedFor(checker);
    expect(await countersignRevisionAction({ revisionId: revision.id, password: checker.password, confirmed: true })).toMatchObject({ ok: true, data: { status: 'countersigned' } });
  });

  it('locks countersigning after five wrong passwords, logs it, and leaves signing in alone', async () => {
    const checker = await createTestUser('checker');
    const revision = await submittedFor(checker);
    for (let i = 0; i < 5; i++) expect(await countersignRevisionAction({ revisionId: revision.id, password: `guess-${i}`, confirmed: true })).toMatchObject({ ok: false, status: 400 });
    expect(await countersignRevisionAction({ revisionId: revision.id, password: checker.password, confirmed: true })).toMatchObject({ ok: false, status: 429, error: expect.stringContaining('Too many wrong passwords while countersigning') });
    expect((await Revision.findByPk(revision.id))?.status).toBe('submitted');
    expect(await AuditEvent.count({ where: { entityId: checker.user.id, action: 'user.countersign-password-failed' } })).toBe(5);
    expect(await AuditEvent.count({ where: { entityId: checker.user.id, action: 'user.countersign-locked-out' } })).toBe(1);
    await expect(signIn({ email: checker.user.email, password: checker.password, clientAddress: '203.0.113.67' })).resolves.toMatchObject({ user: { id: checker.user.id } });
  });
});
