import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { database } from '@/lib/db';
import type { AuditFilter } from '@/lib/validation/audit-filter-schema';
import { auditTrailCsv } from './audit-trail-csv';
import { recordAuditEvent } from './record-audit-event';

const FILTER_FIELDS = ['person', 'action', 'scheme', 'from', 'to', 'q'] as const;

/**
 * The CSV of the filtered trail, and an event saying who took that copy with which filters: the export names people,
 * so taking one is itself on the record. No copy is served unless its event was recorded.
 */
export async function exportAuditTrail({ filter, admin }: { filter: AuditFilter; admin: SessionUser }) {
  const { csv, events } = await auditTrailCsv({ filter: { ...filter, before: null } });
  const filters = Object.fromEntries(FILTER_FIELDS.filter((field) => filter[field]).map((field) => [field, filter[field]]));
  await database().transaction((transaction) => recordAuditEvent({ actorId: admin.id, action: 'audit.exported', entityType: 'audit_trail', details: { events, filters } }, transaction));
  return csv;
}
