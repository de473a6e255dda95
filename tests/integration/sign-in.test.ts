import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { lucia } from '@/lib/auth/lucia';
import { signIn } from '@/lib/auth/sign-in';
import { signOut } from '@/lib/auth/sign-out';
import { THROTTLE_RULES } from '@/lib/auth/throttle-rules';
import { AuditEvent, closeSequelize, database } from '@/lib/db';
import { signInAction } from '@/app/(auth)/sign-in/actions';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
beforeAll(async () => (db = await useTestDatabase()));
afterAll(async () => db.cleanup());

// Documentation addresses (RFC 5737); each test uses its own so the per-client budget of one test cannot leak into another.
let nextClient = 1;
const newClient = () => `198.51.100.${nextClient++}`;
const NOW = Date.UTC(2031, 3, 1, 9, 0, 0);

const eventsFor = (userId: string, action: string) => AuditEvent.count({ where: { entityId: userId, action } });
const outcome = (attempt: Promise<unknown>) => attempt.then(() => 200, (e: { status?: number }) => e.status ?? 500);

describe('signing in', () => {
  let account: Awaited<ReturnType<typeof createTestUser>>;
  let client: string;
  beforeEach(async () => {
    account = await createTestUser('designer');
    client = newClient();
  });

  it('opens a new session for the right password and invalidates the one presented before (fixation)', async () => {
    const planted = await lucia().createSession(account.user.id, {});
    const { session, cookie } = await signIn({ email: account.user.email.toUpperCase(), password: account.password, previousSessionId: planted.id, clientAddress: client });
    expect(session.id).not.toBe(planted.id);
    expect(cookie.attributes).toMatchObject({ httpOnly: true, sameSite: 'lax', path: '/' });
    expect((await lucia().validateSession(planted.id)).session).toBeNull();
    expect((await lucia().validateSession(session.id)).user?.id).toBe(account.user.id);
  });

  it('refuses a wrong password with a clear message, opens no session, and logs the failure without the typed address', async () => {
    const before = await tableSnapshot();
    await expect(signIn({ email: account.user.email, password: 'wrong-password', clientAddress: client })).rejects.toMatchObject({ status: 401, message: expect.stringContaining('do not match an active account') });
    const after = await tableSnapshot();
    expect(after).toEqual({ ...before, audit_events: before.audit_events + 1, sign_in_attempts: before.sign_in_attempts + 3 });
    const logged = await AuditEvent.findOne({ where: { entityId: account.user.id, action: 'user.sign-in-failed' } });
    expect(logged).toMatchObject({ actorId: null, entityType: 'user' });
    expect(JSON.parse(logged!.detailsJson)).toEqual({ reason: 'wrong password' });
    const [stored] = (await database().query('SELECT key FROM sign_in_attempts')) as [{ key: string }[], unknown];
    expect(stored.every((row) => /^[0-9a-f]{64}$/.test(row.key))).toBe(true);
  });

  it('refuses an unknown user with the same message and keeps nothing of what was typed', async () => {
    const typed = 'my-secret-password-in-the-wrong-field@example.test';
    await expect(signIn({ email: typed, password: 'whatever-it-is', clientAddress: client })).rejects.toMatchObject({ status: 401, message: expect.stringContaining('do not match an active account') });
    const dump = JSON.stringify(await Promise.all(['audit_events', 'sign_in_attempts'].map((t) => database().query(`SELECT * FROM ${t}`))));
    expect(dump).not.toContain('my-secret-password');
  });

  it('refuses an invited account that has not set its password', async () => {
    const invited = await createTestUser('checker', { status: 'invited' });
    await expect(signIn({ email: invited.user.email, password: invited.password, clientAddress: client })).rejects.toMatchObject({ status: 401 });
  });

  it('locks the account for that client after five failures, even with the right password, storing nothing more, and logs the lock-out', async () => {
    for (let i = 0; i < 5; i++) await expect(signIn({ email: account.user.email, password: `wrong-${i}`, clientAddress: client, now: NOW })).rejects.toMatchObject({ status: 401 });
    const before = await tableSnapshot();
    await expect(signIn({ email: account.user.email, password: account.password, clientAddress: client, now: NOW + 60_000 })).rejects.toMatchObject({ status: 429, message: expect.stringMatching(/Too many failed sign-ins for this account from this computer\. Try again in 14 minute\(s\)/) });
    expect(await tableSnapshot()).toEqual(before);
    expect(await eventsFor(account.user.id, 'user.sign-in-locked-out')).toBe(1);
    await expect(signIn({ email: account.user.email, password: account.password, clientAddress: client, now: NOW + THROTTLE_RULES['account-client'].windowMs })).resolves.toMatchObject({ user: { id: account.user.id } });
  });

  it('lets no more than five of 200 parallel wrong passwords from one client reach the password check', async () => {
    const outcomes = await Promise.all(Array.from({ length: 200 }, (_, i) => outcome(signIn({ email: account.user.email, password: `guess-${i}`, clientAddress: client, now: NOW }))));
    expect(outcomes.filter((s) => s === 401)).toHaveLength(5);
    expect(outcomes.filter((s) => s === 429)).toHaveLength(195);
    expect(await eventsFor(account.user.id, 'user.sign-in-failed')).toBe(5);
  });

  it('keeps the counts in the database, so a restart does not clear a lock', async () => {
    for (let i = 0; i < 5; i++) await outcome(signIn({ email: account.user.email, password: `wrong-${i}`, clientAddress: client, now: NOW }));
    await closeSequelize();
    await expect(signIn({ email: account.user.email, password: account.password, clientAddress: client, now: NOW + 1000 })).rejects.toMatchObject({ status: 429 });
  });

  it('does not let a stranger lock the owner out: the owner signs in from another client', async () => {
    const stranger = client;
    for (let i = 0; i < 5; i++) await outcome(signIn({ email: account.user.email, password: `wrong-${i}`, clientAddress: stranger, now: NOW }));
    await expect(signIn({ email: account.user.email, password: account.password, clientAddress: stranger, now: NOW })).rejects.toMatchObject({ status: 429 });
    await expect(signIn({ email: account.user.email, password: account.password, clientAddress: newClient(), now: NOW })).resolves.toMatchObject({ user: { id: account.user.id } });
  });

  it('slows the account down, for every client, once many clients have guessed; the owner waits seconds, not a lock-out', async () => {
    const { free, capMs } = THROTTLE_RULES.account as { free: number; capMs: number };
    for (let i = 0; i < free; i++) await expect(signIn({ email: account.user.email, password: `wrong-${i}`, clientAddress: newClient(), now: NOW })).rejects.toMatchObject({ status: 401 });
    await expect(signIn({ email: account.user.email, password: account.password, clientAddress: newClient(), now: NOW })).rejects.toMatchObject({ status: 429, message: expect.stringMatching(/many failed sign-ins\. Wait 1 second\(s\)/) });
    await expect(signIn({ email: account.user.email, password: account.password, clientAddress: newClient(), now: NOW + capMs })).resolves.toMatchObject({ user: { id: account.user.id } });
  });

  it('throttles one client spraying many accounts: of 100 guesses over 25 addresses only the first 20 are checked', async () => {
    const { free } = THROTTLE_RULES.client as { free: number };
    const sprayer = client;
    const addresses = [account.user.email, ...Array.from({ length: 24 }, (_, i) => `someone-${i}@example.test`)];
    const outcomes: number[] = [];
    for (let round = 0; round < 4; round++) for (const email of addresses) outcomes.push(await outcome(signIn({ email, password: `spray-${round}`, clientAddress: sprayer, now: NOW })));
    expect(outcomes.filter((s) => s === 401)).toHaveLength(free);
    expect(outcomes.filter((s) => s === 429)).toHaveLength(100 - free);
    await expect(signIn({ email: account.user.email, password: account.password, clientAddress: sprayer, now: NOW })).rejects.toMatchObject({ status: 429, message: expect.stringContaining('from this network') });
    await expect(signIn({ email: account.user.email, password: account.password, clientAddress: newClient(), now: NOW })).resolves.toMatchObject({ user: { id: account.user.id } });
  });

  it('gives the right password back to the budgets: a typo or two never add up to a lock', async () => {
    for (let round = 0; round < 5; round++) {
      await expect(signIn({ email: account.user.email, password: 'typo', clientAddress: client, now: NOW })).rejects.toMatchObject({ status: 401 });
      await expect(signIn({ email: account.user.email, password: account.password, clientAddress: client, now: NOW })).resolves.toBeTruthy();
    }
  });

  it('logs signing out in the audit trail', async () => {
    const { session } = await signIn({ email: account.user.email, password: account.password, clientAddress: client });
    await signOut({ sessionId: session.id, userId: account.user.id });
    const event = await AuditEvent.findOne({ where: { entityId: account.user.id, action: 'user.signed-out' } });
    expect(event).toMatchObject({ actorId: account.user.id });
    expect(JSON.parse(event!.detailsJson)).toEqual({ everywhere: false });
  });

  it('answers malformed form input with field messages and stores nothing', async () => {
    const before = await tableSnapshot();
    const result = await signInAction({ email: 'not-an-address', password: '' });
    expect(result).toMatchObject({ ok: false, status: 400 });
    if (result.ok) throw new Error('unreachable');
    expect(result.issues.map((i) => i.path).sort()).toEqual(['email', 'password']);
    expect(result.issues.find((i) => i.path === 'email')?.message).toMatch(/e-mail address/);
    expect(await tableSnapshot()).toEqual(before);
  });
});

describe('where the browser goes after signing in', () => {
  const signInThenGo = async (next: string) => {
    const { user, password } = await createTestUser('liaison');
    const result = await signInAction({ email: user.email, password, next });
    if (!result.ok) throw new Error(`sign-in failed: ${result.error}`);
    return result.data.next;
  };

  it.each(['/\\evil.example/landed', '/\t/evil.example/landed', '/.//evil.example/landed', '//evil.example/landed', 'https://evil.example/landed', 'javascript:alert(1)'])('goes home, not to another site, for next=%j', async (next) => {
    expect(await signInThenGo(next)).toBe('/home');
  });

  it('keeps a page of the portal, with its query', async () => {
    expect(await signInThenGo('/schemes/abc?tab=checks')).toBe('/schemes/abc?tab=checks');
  });
});
