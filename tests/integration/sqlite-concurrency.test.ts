import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import { AuditEvent, database } from '@/lib/db';
import { holdWriteLockInAnotherProcess } from './support/lock-holder';
import { useTestDatabase } from './support/test-database';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
beforeAll(async () => (db = await useTestDatabase()));
afterAll(async () => db.cleanup());

describe('SQLite under concurrent writers', () => {
  it('queues writers on the busy timeout while another process holds the lock, losing none, audit chain intact', async () => {
    const sequelize = database();
    const { released } = await holdWriteLockInAnotherProcess(db.file, 600);
    const writers = Array.from({ length: 12 }, (_, i) => sequelize.transaction((t) => recordAuditEvent({ actorId: null, action: `concurrent.${i}`, entityType: 'test' }, t)));
    const results = await Promise.allSettled(writers);
    const releasedAt = await released;

    expect(results.filter((r) => r.status === 'rejected')).toEqual([]);
    const events = await AuditEvent.findAll({ order: [['id', 'ASC']] });
    const concurrent = events.filter((e) => e.action.startsWith('concurrent.'));
    expect(concurrent.length).toBe(12);
    // None could commit while the other process held the lock: every one waited for it, and none was lost.
    expect(releasedAt).not.toBe('');
    for (const e of concurrent) expect(e.at >= releasedAt).toBe(true);
    for (let i = 1; i < events.length; i++) expect(events[i].previousHash).toBe(events[i - 1].hash);
  });
});
