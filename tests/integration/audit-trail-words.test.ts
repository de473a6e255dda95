import { readFileSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { AUDIT_ACTION_CODES } from '@/lib/audit/audit-actions';
import { describeAuditEvent } from '@/lib/audit/describe-audit-event';
import { signIn } from '@/lib/auth/sign-in';
import { THROTTLE_RULES } from '@/lib/auth/throttle-rules';
import { AuditEvent } from '@/lib/db';
import { appendEventAt } from './support/audit-fixtures';
import { RAFE_CLIENT, useAuditScenario, view } from './support/audit-scenario';
import { databaseDigest } from './support/database-digest';

// The audit trail as an investigator reads it: every event in words with names, filtered and searched.
const scenario = useAuditScenario();

describe('each event in plain words', () => {
  it('words role changes, invitations, failed sign-ins, lock-outs and sign-outs with names, never codes or ids', async () => {
    const limit = THROTTLE_RULES['account-client'];
    if (limit.kind !== 'lock') throw new Error('the per-computer rule is a lock');
    for (let i = 1; i < limit.limit; i++) await signIn({ email: scenario.s.rafe.user.email, password: `wrong-${i}`, clientAddress: RAFE_CLIENT }).catch(() => undefined);
    const { entries } = await view();
    const said = entries.map((e) => `${e.who} ${e.what}`);
    expect(said).toContain('Ida Marchbank changed Rafe Calloway’s role from landowner liaison to planning officer');
    expect(said).toContain(`Ida Marchbank invited ${scenario.s.petraAddress} as designer`);
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
    const { entries, issues } = await view({ person: scenario.s.rafe.user.id });
    expect(issues).toEqual([]);
    const rows = await AuditEvent.findAll();
    const expected = rows.filter((r) => r.actorId === scenario.s.rafe.user.id || (r.entityType === 'user' && r.entityId === scenario.s.rafe.user.id)).map((r) => r.id).sort((a, b) => b - a);
    expect(entries.map((e) => e.number)).toEqual(expected);
    expect(expected.length).toBeGreaterThan(3);
  });

  it('by kind of event, by scheme and by day (both ends included)', async () => {
    const roleChanges = await view({ action: 'user.role-changed' });
    expect(roleChanges.entries.map((e) => e.what)).toEqual(['changed Rafe Calloway’s role from landowner liaison to planning officer']);
    const onScheme = await view({ scheme: scenario.s.schemeId });
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
    expect((await view({ q: 'PETRA.' })).entries.map((e) => e.what)).toEqual([`invited ${scenario.s.petraAddress} as designer`]);
    expect((await view({ q: 'changed a role' })).entries.map((e) => e.what)).toEqual(['changed Rafe Calloway’s role from landowner liaison to planning officer']);
    expect((await view({ q: '+wendle' })).entries.map((e) => e.scheme)).toEqual(['@SM-EVIL +Wendle sluice']);
  });

  it('treats % and _ as plain characters', async () => {
    expect((await view({ q: '%' })).entries).toEqual([]);
    expect((await view({ q: '_' })).entries).toEqual([]);
  });
});


// Last in the file: the events it adds are seen by no other test. BST in 2026 runs from 29 March to 25 October
// (common knowledge of the UK rule: the last Sundays of March and October, at 01:00 UTC).
describe('days in the portal’s time zone', () => {
  const at = (entries: { at: string }[]) => entries.map((e) => e.at);

  it('a day is the portal’s day, 23 or 25 hours long across a change of clocks, not the UTC day', async () => {
    await appendEventAt('2026-07-01T23:30:00.000Z', { action: 'scheme.created', entityType: 'scheme' });
    await appendEventAt('2026-10-24T23:30:00.000Z', { action: 'scheme.created', entityType: 'scheme' });
    await appendEventAt('2026-10-25T23:30:00.000Z', { action: 'scheme.created', entityType: 'scheme' });
    await appendEventAt('2026-10-26T00:30:00.000Z', { action: 'scheme.created', entityType: 'scheme' });
    const saved = process.env.PORTAL_TIME_ZONE;
    try {
      process.env.PORTAL_TIME_ZONE = 'Europe/London';
      expect(at((await view({ from: '2026-07-02', to: '2026-07-02' })).entries)).toEqual(['2026-07-01T23:30:00.000Z']);
      expect((await view({ from: '2026-07-01', to: '2026-07-01' })).entries).toEqual([]);
      expect(at((await view({ from: '2026-10-25', to: '2026-10-25' })).entries)).toEqual(['2026-10-25T23:30:00.000Z', '2026-10-24T23:30:00.000Z']);
      expect(at((await view({ from: '2026-10-26', to: '2026-10-26' })).entries)).toEqual(['2026-10-26T00:30:00.000Z']);
      process.env.PORTAL_TIME_ZONE = 'UTC';
      expect(at((await view({ from: '2026-07-01', to: '2026-07-01' })).entries)).toEqual(['2026-07-01T23:30:00.000Z']);
      expect(at((await view({ from: '2026-10-25', to: '2026-10-25' })).entries)).toEqual(['2026-10-25T23:30:00.000Z']);
    } finally {
      if (saved === undefined) delete process.env.PORTAL_TIME_ZONE;
      else process.env.PORTAL_TIME_ZONE = saved;
    }
  });
});
