import { readFileSync, readdirSync, statSync } from 'node:fs';
import { createServer } from 'node:net';
import path from 'node:path';
import { parse } from 'csv-parse/sync';
import { Op } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AUDIT_ACTION_CODES } from '@/lib/audit/audit-actions';
import { auditTrailView } from '@/lib/audit/audit-trail-view';
import { describeAuditEvent } from '@/lib/audit/describe-audit-event';
import { signIn } from '@/lib/auth/sign-in';
import { signOut } from '@/lib/auth/sign-out';
import { THROTTLE_RULES } from '@/lib/auth/throttle-rules';
import { AuditEvent } from '@/lib/db';
import { changeUserRole } from '@/lib/users/change-user-role';
import { inviteUser } from '@/lib/users/invite-user';
import { appendEventAt, tamperWithTrail } from './support/audit-fixtures';
import { databaseDigest } from './support/database-digest';
import { createTestScheme } from './support/scheme-factory';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

type Person = Awaited<ReturnType<typeof createTestUser>>;
let db: Awaited<ReturnType<typeof useTestDatabase>>;
let admin: Person;
let rafe: Person;
let petraAddress: string;
let formulaDesigner: Person;
let schemeId: string;
const CLIENT = '203.0.113.40';

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const server = createServer().listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

const named = async (role: Parameters<typeof createTestUser>[0], name: string) => {
  const person = await createTestUser(role);
  await person.user.update({ name });
  return { ...person, sessionUser: { ...person.sessionUser, name } };
};
const view = (query: Record<string, string> = {}) => auditTrailView(query);
const csvOf = async (query = '') => {
  signedInAs(admin.sessionUser);
  return callRoute('admin/audit/csv', 'GET', { query });
};

beforeAll(async () => {
  process.env.SMTP_PORT = String(await freePort());
  delete process.env.SMTP_URL;
  db = await useTestDatabase();
  admin = await named('admin', 'Ida Marchbank');
  rafe = await named('liaison', 'Rafe Calloway');
  formulaDesigner = await named('designer', '=HYPERLINK("http://evil.test","Quill")');
  const { scheme } = await createTestScheme(formulaDesigner.user.id);
  await scheme.update({ name: '+Wendle sluice', reference: '@SM-EVIL' });
  schemeId = scheme.id;
  await appendEventAt('2026-03-01T09:00:00.000Z', { actorId: formulaDesigner.user.id, action: 'scheme.created', entityType: 'scheme', entityId: schemeId, schemeId, details: { reference: '@SM-EVIL', name: '+Wendle sluice' } });
  await changeUserRole({ input: { userId: rafe.user.id, role: 'planning' }, admin: admin.sessionUser });
  petraAddress = `petra.${Date.now()}@wendle-valley.test`;
  await inviteUser({ input: { email: petraAddress, name: 'Petra Quill', role: 'designer' }, admin: admin.sessionUser, baseUrl: 'http://localhost:3000' });
  await expect(signIn({ email: rafe.user.email, password: 'not-his-password', clientAddress: CLIENT })).rejects.toMatchObject({ status: 401 });
  await expect(signIn({ email: 'nobody@wendle-valley.test', password: 'whatever', clientAddress: '203.0.113.41' })).rejects.toMatchObject({ status: 401 });
  const signedIn = await signIn({ email: admin.user.email, password: admin.password, clientAddress: '203.0.113.42' });
  await signOut({ sessionId: signedIn.session.id, userId: admin.user.id });
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

describe('each event in plain words', () => {
  it('words role changes, invitations, failed sign-ins, lock-outs and sign-outs with names, never codes or ids', async () => {
    const limit = THROTTLE_RULES['account-client'];
    if (limit.kind !== 'lock') throw new Error('the per-computer rule is a lock');
    for (let i = 1; i < limit.limit; i++) await signIn({ email: rafe.user.email, password: `wrong-${i}`, clientAddress: CLIENT }).catch(() => undefined);
    const { entries } = await view();
    const said = entries.map((e) => `${e.who} ${e.what}`);
    expect(said).toContain('Ida Marchbank changed Rafe Calloway’s role from landowner liaison to planning officer');
    expect(said).toContain(`Ida Marchbank invited ${petraAddress} as designer`);
    expect(said).toContain('Someone not signed in tried to sign in to Rafe Calloway’s account with a wrong password');
    expect(said).toContain('Someone not signed in tried to sign in with an e-mail address that has no account');
    expect(said).toContain('Someone not signed in was locked out of Rafe Calloway’s account from one computer after repeated failed sign-ins');
    expect(said).toContain('Ida Marchbank signed in');
    expect(said).toContain('Ida Marchbank signed out');
    for (const line of said) {
      expect(line, line).not.toMatch(/[0-9a-f]{8}-[0-9a-f]{4}-/);
      for (const code of AUDIT_ACTION_CODES) expect(line, line).not.toContain(code);
    }
  });

  it('has its own words for every kind of event the portal records', () => {
    const recorded = new Set<string>();
    const walk = (dir: string): string[] => readdirSync(dir).flatMap((n) => (statSync(path.join(dir, n)).isDirectory() ? walk(path.join(dir, n)) : [path.join(dir, n)]));
    for (const file of [...walk('src'), ...walk('db/seeds')].filter((f) => /\.tsx?$/.test(f))) {
      const source = readFileSync(file, 'utf8');
      if (!source.includes('recordAuditEvent(')) continue;
      for (const line of source.split('\n').filter((l) => /\baction\b/.test(l))) {
        for (const match of line.matchAll(/'((?:user|demo|scheme|revision|review|certificate|parcels|letters?|audit)\.[a-z-]+)'/g)) recorded.add(match[1]);
      }
    }
    expect(recorded.size).toBeGreaterThan(25);
    for (const code of recorded) expect(AUDIT_ACTION_CODES, `${code} has no entry in src/lib/audit/audit-actions.ts`).toContain(code);
    const names = { person: () => 'Someone', scheme: () => null };
    for (const code of AUDIT_ACTION_CODES) {
      const { what } = describeAuditEvent({ action: code, actorId: 'x', entityType: 'user', entityId: 'y', schemeId: null, detailsJson: '{}' }, names);
      expect(what, code).not.toMatch(/^recorded:/);
      expect(what, code).not.toContain(code);
    }
  });

  it('still words a kind of event it has no words for, without its code', () => {
    const { what } = describeAuditEvent({ action: 'mail.bounced-back', actorId: null, entityType: 'letter', entityId: null, schemeId: null, detailsJson: '{}' }, { person: () => 'x', scheme: () => null });
    expect(what).toBe('recorded: mail bounced back');
  });
});

describe('filters', () => {
  it('by person: events they did or that were about them', async () => {
    const { entries, issues } = await view({ person: rafe.user.id });
    expect(issues).toEqual([]);
    const rows = await AuditEvent.findAll();
    const expected = rows.filter((r) => r.actorId === rafe.user.id || (r.entityType === 'user' && r.entityId === rafe.user.id)).map((r) => r.id).sort((a, b) => b - a);
    expect(entries.map((e) => e.number)).toEqual(expected);
    expect(expected.length).toBeGreaterThan(3);
  });

  it('by kind of event, by scheme and by day (UTC, both ends included)', async () => {
    const roleChanges = await view({ action: 'user.role-changed' });
    expect(roleChanges.entries.map((e) => e.what)).toEqual(['changed Rafe Calloway’s role from landowner liaison to planning officer']);
    const onScheme = await view({ scheme: schemeId });
    expect(onScheme.entries.map((e) => e.scheme)).toEqual(['@SM-EVIL +Wendle sluice']);
    expect((await view({ from: '2026-03-01', to: '2026-03-01' })).entries.map((e) => e.at)).toEqual(['2026-03-01T09:00:00.000Z']);
    expect((await view({ from: '2026-03-02', to: '2026-03-31', action: 'scheme.created' })).entries).toEqual([]);
    expect((await view({ to: '2026-02-28' })).entries).toEqual([]);
  });

  it('refuses bad filters with a message naming the field, shows no events and stores nothing', async () => {
    const before = await databaseDigest();
    const cases: [Record<string, string>, string][] = [
      [{ action: 'certificate.deleted' }, 'action'],
      [{ from: '2026-02-30' }, 'from'],
      [{ to: '2026-13-01' }, 'to'],
      [{ from: '2026-05-02', to: '2026-05-01' }, 'to'],
      [{ person: 'no-such-person' }, 'person'],
      [{ scheme: 'no-such-scheme' }, 'scheme'],
      [{ before: 'x' }, 'before'],
      [{ q: 'x'.repeat(201) }, 'q'],
    ];
    for (const [query, field] of cases) {
      const result = await view(query);
      expect(result.issues.map((i) => i.path), JSON.stringify(query)).toContain(field);
      expect(result.issues.every((i) => i.message.length > 10)).toBe(true);
      expect(result.entries).toEqual([]);
      expect(result.filter).toBeNull();
    }
    expect(await databaseDigest()).toBe(before);
  });
});

describe('search', () => {
  it('finds people by name or address, kinds of event by their words and details by their text', async () => {
    const byName = await view({ q: 'calloway' });
    expect(byName.entries.some((e) => e.what.includes('Rafe Calloway’s role'))).toBe(true);
    expect(byName.entries.some((e) => e.what.startsWith('invited'))).toBe(false);
    expect((await view({ q: 'PETRA.' })).entries.map((e) => e.what)).toEqual([`invited ${petraAddress} as designer`]);
    expect((await view({ q: 'changed a role' })).entries.map((e) => e.what)).toEqual(['changed Rafe Calloway’s role from landowner liaison to planning officer']);
    expect((await view({ q: '+wendle' })).entries.map((e) => e.scheme)).toEqual(['@SM-EVIL +Wendle sluice']);
  });

  it('treats % and _ as plain characters', async () => {
    expect((await view({ q: '%' })).entries).toEqual([]);
    expect((await view({ q: '_' })).entries).toEqual([]);
  });
});

describe('paging past the latest 100', () => {
  it('keys each page on the event number, so pages neither overlap nor shift as new events arrive', async () => {
    for (let i = 0; i < 230; i++) await appendEventAt(`2026-04-01T10:${String(Math.floor(i / 60)).padStart(2, '0')}:${String(i % 60).padStart(2, '0')}.000Z`, { actorId: admin.user.id, action: 'certificate.downloaded', entityType: 'certificate', details: { number: `SMC-2026-${String(i).padStart(4, '0')}` } });
    const filter = { action: 'certificate.downloaded' };
    const first = await view(filter);
    expect(first.entries).toHaveLength(100);
    expect(first.entries[0].what).toBe('downloaded certificate SMC-2026-0229');
    expect(first.olderBefore).toBe(first.entries[99].number);
    await appendEventAt('2026-04-02T08:00:00.000Z', { actorId: admin.user.id, action: 'certificate.downloaded', entityType: 'certificate', details: { number: 'SMC-2026-9999' } });
    const second = await view({ ...filter, before: String(first.olderBefore) });
    expect(second.entries).toHaveLength(100);
    expect(second.entries[0].what).toBe('downloaded certificate SMC-2026-0129');
    const third = await view({ ...filter, before: String(second.olderBefore) });
    expect(third.entries.map((e) => e.what).at(-1)).toBe('downloaded certificate SMC-2026-0000');
    expect(third.entries).toHaveLength(30);
    expect(third.olderBefore).toBeNull();
    const seen = [...first.entries, ...second.entries, ...third.entries].map((e) => e.number);
    expect(new Set(seen).size).toBe(230);
  });
});

describe('CSV export', () => {
  it('lists every matching event (all pages) in words, not cached, with names that start a formula neutralised', async () => {
    const response = await csvOf('action=certificate.downloaded');
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toMatch(/^text\/csv/);
    expect(response.headers.get('cache-control')).toMatch(/no-store/);
    expect(response.headers.get('content-disposition')).toMatch(/^attachment; filename="sillmark-audit-trail-\d{4}-\d{2}-\d{2}\.csv"$/);
    const rows = parse(await response.text()) as string[][];
    expect(rows[0]).toEqual(['Event', 'When (UTC)', 'Who', 'What', 'Scheme', 'Hash']);
    expect(rows).toHaveLength(1 + 231);
    expect(rows[1][3]).toBe('downloaded certificate SMC-2026-9999');

    const exported = await AuditEvent.findOne({ where: { action: 'audit.exported' }, order: [['id', 'DESC']] });
    expect(exported).toMatchObject({ actorId: admin.user.id, detailsJson: '{"events":231,"filters":{"action":"certificate.downloaded"}}' });
    expect((await view({ action: 'audit.exported' })).entries.map((e) => `${e.who} ${e.what}`)).toEqual(['Ida Marchbank exported 231 events of the audit trail as CSV, filtered by kind of event']);

    const onScheme = parse(await (await csvOf(`scheme=${schemeId}`)).text()) as string[][];
    expect(onScheme).toHaveLength(2);
    expect(onScheme[1][2]).toBe('\'=HYPERLINK("http://evil.test","Quill")');
    expect(onScheme[1][4]).toBe("'@SM-EVIL +Wendle sluice");
    expect(onScheme[1][0]).toMatch(/^\d+$/);
  });

  it('answers a prefetch with nothing and records nothing', async () => {
    const before = await databaseDigest();
    signedInAs(admin.sessionUser);
    const prefetch = await callRoute('admin/audit/csv', 'GET', { headers: { 'sec-purpose': 'prefetch' } });
    expect(prefetch.status).toBe(204);
    expect(await prefetch.text()).toBe('');
    expect(await databaseDigest()).toBe(before);
  });

  it('refuses bad filters with 400 naming the field, and other roles with 403', async () => {
    const bad = await csvOf('from=2026-13-01');
    expect(bad.status).toBe(400);
    expect(((await bad.json()) as { issues: { path: string }[] }).issues.map((i) => i.path)).toEqual(['from']);
    signedInAs(rafe.sessionUser);
    expect((await callRoute('admin/audit/csv', 'GET')).status).toBe(403);
  });
});

describe('the hash chain is verified when the trail is shown', () => {
  it('is intact while nobody has touched the table', async () => {
    const result = await view();
    expect(result.chain).toMatchObject({ intact: true, events: await AuditEvent.count() });
    expect(result.chainAlarm).toBeNull();
  });

  it('names the event whose row was edited with SQL', async () => {
    const target = await AuditEvent.findOne({ where: { action: 'user.role-changed' } });
    await tamperWithTrail("UPDATE audit_events SET details_json = '{\"from\":\"liaison\",\"to\":\"admin\"}' WHERE id = :id", { id: target!.id });
    const result = await view();
    expect(result.chain).toMatchObject({ intact: false, firstBreak: { number: target!.id } });
    expect(result.chainAlarm).toBe(`The audit trail has been tampered with: the chain breaks at event ${target!.id}.`);
    expect(result.chain.intact ? '' : result.chain.firstBreak.problem).toMatch(/altered after it was recorded/);
  });

  it('names the event after one that was removed', async () => {
    await tamperWithTrail("UPDATE audit_events SET details_json = '{\"from\":\"liaison\",\"to\":\"planning\"}' WHERE action = 'user.role-changed'", {});
    expect((await view()).chain.intact).toBe(true);
    const removed = await AuditEvent.findOne({ where: { action: 'user.invited' } });
    await tamperWithTrail('DELETE FROM audit_events WHERE id = :id', { id: removed!.id });
    const next = await AuditEvent.findOne({ where: { id: { [Op.gt]: removed!.id } }, order: [['id', 'ASC']] });
    const result = await view();
    expect(result.chainAlarm).toContain(`event ${next!.id}`);
    expect(result.chain.intact ? '' : result.chain.firstBreak.problem).toMatch(/does not follow on/);
  });
});
