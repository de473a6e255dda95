import { parse } from 'csv-parse/sync';
import { Op } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { AuditEvent } from '@/lib/db';
import { appendEventAt, tamperWithTrail } from './support/audit-fixtures';
import { useAuditScenario, view } from './support/audit-scenario';
import { databaseDigest } from './support/database-digest';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';

// The audit trail past its first page, its CSV export, and the hash chain checked each time it is shown.
const scenario = useAuditScenario();
const { csvOf } = scenario;

describe('paging past the latest 100', () => {
  it('keys each page on the event number, so pages neither overlap nor shift as new events arrive', async () => {
    for (let i = 0; i < 230; i++) await appendEventAt(`2026-04-01T10:${String(Math.floor(i / 60)).padStart(2, '0')}:${String(i % 60).padStart(2, '0')}.000Z`, { actorId: scenario.s.admin.user.id, action: 'certificate.downloaded', entityType: 'certificate', details: { number: `SMC-2026-${String(i).padStart(4, '0')}` } });
    const filter = { action: 'certificate.downloaded' };
    const first = await view(filter);
    expect(first.entries).toHaveLength(100);
    expect(first.entries[0].what).toBe('downloaded certificate SMC-2026-0229');
    expect(first.olderBefore).toBe(first.entries[99].number);
    await appendEventAt('2026-04-02T08:00:00.000Z', { actorId: scenario.s.admin.user.id, action: 'certificate.downloaded', entityType: 'certificate', details: { number: 'SMC-2026-9999' } });
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
    expect(exported).toMatchObject({ actorId: scenario.s.admin.user.id, detailsJson: '{"events":231,"filters":{"action":"certificate.downloaded"}}' });
    expect((await view({ action: 'audit.exported' })).entries.map((e) => `${e.who} ${e.what}`)).toEqual(['Ida Marchbank exported 231 events of the audit trail as CSV, filtered by kind of event']);

    const onScheme = parse(await (await csvOf(`scheme=${scenario.s.schemeId}`)).text()) as string[][];
    expect(onScheme).toHaveLength(2);
    expect(onScheme[1][2]).toBe('\'=HYPERLINK("http://evil.test","Quill")');
    expect(onScheme[1][4]).toBe("'@SM-EVIL +Wendle sluice");
    expect(onScheme[1][0]).toMatch(/^\d+$/);
  });

  it('answers a prefetch with nothing and records nothing', async () => {
    const before = await databaseDigest();
    signedInAs(scenario.s.admin.sessionUser);
    const prefetch = await callRoute('admin/audit/csv', 'GET', { headers: { 'sec-purpose': 'prefetch' } });
    expect(prefetch.status).toBe(204);
    expect(await prefetch.text()).toBe('');
    expect(await databaseDigest()).toBe(before);
  });

  it('refuses bad filters with 400 naming the field, and other roles with 403', async () => {
    const bad = await csvOf('from=2026-13-01');
    expect(bad.status).toBe(400);
    expect(((await bad.json()) as { issues: { path: string }[] }).issues.map((i) => i.path)).toEqual(['from']);
    signedInAs(scenario.s.rafe.sessionUser);
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
