import canonicalize from 'canonicalize';
import { GENESIS_HASH, auditEventHash } from '@/lib/audit/audit-hash';
import { AuditEvent, database } from '@/lib/db';

/**
 * Appends a correctly chained event recorded at a chosen moment, as recordAuditEvent would have at that time, so
 * date filters can be tested on fixed days rather than on the clock.
 */
export async function appendEventAt(at: string, entry: { actorId?: string | null; action: string; entityType?: string; entityId?: string | null; schemeId?: string | null; details?: Record<string, unknown> }): Promise<AuditEvent> {
  return database().transaction(async (transaction) => {
    const last = await AuditEvent.findOne({ order: [['id', 'DESC']], transaction });
    const fields = { previousHash: last?.hash ?? GENESIS_HASH, at, actorId: entry.actorId ?? null, action: entry.action, entityType: entry.entityType ?? 'user', entityId: entry.entityId ?? null, schemeId: entry.schemeId ?? null, detailsJson: canonicalize(entry.details ?? {}) ?? '{}' };
    return AuditEvent.create({ ...fields, hash: auditEventHash(fields) }, { transaction });
  });
}

const NO_UPDATE = `CREATE TRIGGER audit_events_no_update BEFORE UPDATE ON audit_events BEGIN SELECT RAISE(ABORT, 'the audit log is append-only'); END`;
const NO_DELETE = `CREATE TRIGGER audit_events_no_delete BEFORE DELETE ON audit_events BEGIN SELECT RAISE(ABORT, 'the audit log is append-only'); END`;

/** Raw SQL on the trail as only someone with the database file could run it: the guarding triggers are dropped for it and put back as shipped (migration 0001). */
export async function tamperWithTrail(sql: string, replacements: Record<string, unknown>): Promise<void> {
  const sequelize = database();
  await sequelize.query('DROP TRIGGER audit_events_no_update');
  await sequelize.query('DROP TRIGGER audit_events_no_delete');
  try {
    await sequelize.query(sql, { replacements });
  } finally {
    await sequelize.query(NO_UPDATE);
    await sequelize.query(NO_DELETE);
  }
}
