import 'server-only';
import { AuditEvent, database } from '@/lib/db';
import type { AuditFilter } from '@/lib/validation/audit-filter-schema';
import { type AuditDirectory, loadAuditDirectory } from './audit-directory';
import { auditEventWhere } from './audit-event-where';
import { describeAuditEvent } from './describe-audit-event';

export const AUDIT_PAGE_SIZE = 100;

export interface AuditTrailEntry {
  number: number;
  at: string;
  who: string;
  what: string;
  scheme: string | null;
  hash: string;
}

export function toTrailEntry(event: AuditEvent, directory: AuditDirectory): AuditTrailEntry {
  return { number: event.id, at: event.at, ...describeAuditEvent(event, directory.names), hash: event.hash };
}

/**
 * One page of the trail, newest first, in plain words. Pages are keyed on the event number (`before`), so a page
 * stays the same while new events arrive; `olderBefore` starts the next page, or is null on the last one.
 */
export async function listAuditEvents({ filter, limit = AUDIT_PAGE_SIZE }: { filter: AuditFilter; limit?: number }) {
  database();
  const directory = await loadAuditDirectory();
  const rows = await AuditEvent.findAll({ where: auditEventWhere(filter, directory), order: [['id', 'DESC']], limit: limit + 1 });
  const page = rows.slice(0, limit);
  return {
    entries: page.map((row) => toTrailEntry(row, directory)),
    olderBefore: rows.length > limit ? page[page.length - 1].id : null,
    people: directory.people,
    schemes: directory.schemes,
  };
}
