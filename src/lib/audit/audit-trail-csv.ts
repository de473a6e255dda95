import 'server-only';
import { AuditEvent, database } from '@/lib/db';
import { toSafeCsv } from '@/lib/csv/to-safe-csv';
import type { AuditFilter } from '@/lib/validation/audit-filter-schema';
import { loadAuditDirectory } from './audit-directory';
import { auditEventWhere } from './audit-event-where';
import { toTrailEntry } from './list-audit-events';

export const AUDIT_CSV_HEADER = ['Event', 'When (UTC)', 'Who', 'What', 'Scheme', 'Hash'];
// Beyond this the export says so in its last row rather than growing without bound; narrow the filter instead.
export const AUDIT_CSV_MAX_ROWS = 50_000;

/** Every event the filter matches (all pages, newest first), in the trail's words, as formula-safe CSV. */
export async function auditTrailCsv({ filter }: { filter: AuditFilter }): Promise<{ csv: string; events: number }> {
  database();
  const directory = await loadAuditDirectory();
  const rows = await AuditEvent.findAll({ where: auditEventWhere(filter, directory), order: [['id', 'DESC']], limit: AUDIT_CSV_MAX_ROWS + 1 });
  const entries = rows.slice(0, AUDIT_CSV_MAX_ROWS).map((row) => toTrailEntry(row, directory));
  const cells = entries.map((e) => [e.number, e.at, e.who, e.what, e.scheme ?? '', e.hash]);
  if (rows.length > AUDIT_CSV_MAX_ROWS) cells.push(['', '', '', `Only the newest ${AUDIT_CSV_MAX_ROWS} matching events are listed: narrow the filter for older ones.`, '', '']);
  return { csv: toSafeCsv(AUDIT_CSV_HEADER, cells), events: entries.length };
}
