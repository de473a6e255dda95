import { createHash } from 'node:crypto';
import canonicalize from 'canonicalize';

export const GENESIS_HASH = '0'.repeat(64);

export interface HashedFields {
  previousHash: string;
  at: string;
  actorId: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  schemeId: string | null;
  detailsJson: string;
}

/** SHA-256 of the canonical JSON (RFC 8785) of an event's fields and the previous event's hash. */
export function auditEventHash(fields: HashedFields): string {
  const { previousHash, at, actorId, action, entityType, entityId, schemeId, detailsJson } = fields;
  return createHash('sha256').update(canonicalize({ previousHash, at, actorId, action, entityType, entityId, schemeId, detailsJson }) ?? '').digest('hex');
}
