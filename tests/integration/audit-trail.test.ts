import { createHash } from 'node:crypto';
import canonicalize from 'canonicalize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import { AuditEvent, database } from '@/lib/db';
import { useTestDatabase } from './support/test-database';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
beforeAll(async () => (db = await useTestDatabase()));
afterAll(async () => db.cleanup());

describe('the audit trail', () => {
  it('chains each event to the one before by SHA-256', async () => {
    const sequelize = database();
    for (const action of ['a.one', 'a.two', 'a.three']) await sequelize.transaction((t) => recordAuditEvent({ actorId: null, action, entityType: 'test', details: { action } }, t));
    const events = await AuditEvent.findAll({ order: [['id', 'ASC']] });
    expect(events[0].previousHash).toBe('0'.repeat(64));
    for (let i = 1; i < events.length; i++) expect(events[i].previousHash).toBe(events[i - 1].hash);
    const e = events[1];
    const payload = canonicalize({ previousHash: e.previousHash, at: e.at, actorId: e.actorId, action: e.action, entityType: e.entityType, entityId: e.entityId, schemeId: e.schemeId, detailsJson: e.detailsJson });
    expect(createHash('sha256').update(payload!).digest('hex')).toBe(e.hash);
  });

  it('is append-only: the database refuses updates and deletes', async () => {
    const sequelize = database();
    const refusal = (sql: string) => sequelize.query(sql).then(() => 'accepted', (e: { parent?: Error; message: string }) => e.parent?.message ?? e.message);
    expect(await refusal("UPDATE audit_events SET action = 'tampered'")).toMatch(/append-only/);
    expect(await refusal('DELETE FROM audit_events')).toMatch(/append-only/);
    expect(await AuditEvent.count()).toBe(3);
  });

  it('leaves nothing behind when the surrounding transaction fails', async () => {
    const sequelize = database();
    const before = await AuditEvent.count();
    await expect(
      sequelize.transaction(async (t) => {
        await recordAuditEvent({ actorId: null, action: 'rolled.back', entityType: 'test' }, t);
        throw new Error('use case failed');
      }),
    ).rejects.toThrow('use case failed');
    expect(await AuditEvent.count()).toBe(before);
  });
});
