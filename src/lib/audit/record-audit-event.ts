import 'server-only';
import canonicalize from 'canonicalize';
import type { Transaction } from 'sequelize';
import { AuditEvent, database } from '@/lib/db';
import { GENESIS_HASH, auditEventHash } from './audit-hash';

export interface AuditEntry {
  actorId: string | null;
  action: string;
  entityType: string;
  entityId?: string | null;
  schemeId?: string | null;
  details?: Record<string, unknown>;
}

/**
 * Appends one audit event inside the caller's transaction. Each event's hash covers the previous event's hash,
 * so a removed or edited row breaks the chain (the table also refuses UPDATE and DELETE by trigger).
 */
export async function recordAuditEvent(entry: AuditEntry, transaction: Transaction): Promise<AuditEvent> {
  database();
  const last = await AuditEvent.findOne({ order: [['id', 'DESC']], transaction });
  const fields = {
    previousHash: last?.hash ?? GENESIS_HASH,
    at: new Date().toISOString(),
    actorId: entry.actorId,
    action: entry.action,
    entityType: entry.entityType,
    entityId: entry.entityId ?? null,
    schemeId: entry.schemeId ?? null,
    detailsJson: canonicalize(entry.details ?? {}) ?? '{}',
  };
  return AuditEvent.create({ ...fields, hash: auditEventHash(fields) }, { transaction });
}
