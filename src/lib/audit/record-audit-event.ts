import 'server-only';
import { createHash } from 'node:crypto';
import canonicalize from 'canonicalize';
import type { Transaction } from 'sequelize';
import { AuditEvent, database } from '@/lib/db';

export interface AuditEntry {
  actorId: string | null;
  action: string;
  entityType: string;
  entityId?: string | null;
  schemeId?: string | null;
  details?: Record<string, unknown>;
}

const GENESIS_HASH = '0'.repeat(64);

/**
 * Appends one audit event inside the caller's transaction. Each event's hash covers the previous event's hash,
 * so a removed or edited row breaks the chain (the table also refuses UPDATE and DELETE by trigger).
 */
export async function recordAuditEvent(entry: AuditEntry, transaction: Transaction): Promise<AuditEvent> {
  database();
  const last = await AuditEvent.findOne({ order: [['id', 'DESC']], transaction });
  const previousHash = last?.hash ?? GENESIS_HASH;
  const at = new Date().toISOString();
  const detailsJson = canonicalize(entry.details ?? {}) ?? '{}';
  const payload = canonicalize({ previousHash, at, actorId: entry.actorId, action: entry.action, entityType: entry.entityType, entityId: entry.entityId ?? null, schemeId: entry.schemeId ?? null, detailsJson });
  const hash = createHash('sha256').update(payload ?? '').digest('hex');
  return AuditEvent.create(
    { at, actorId: entry.actorId, action: entry.action, entityType: entry.entityType, entityId: entry.entityId ?? null, schemeId: entry.schemeId ?? null, detailsJson, previousHash, hash },
    { transaction },
  );
}
