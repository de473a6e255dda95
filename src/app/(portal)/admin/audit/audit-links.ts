import type { AuditFilter } from '@/lib/validation/audit-filter-schema';

const FIELDS = ['person', 'action', 'scheme', 'from', 'to', 'q'] as const;

function queryOf(filter: AuditFilter, before: number | null): string {
  const params = new URLSearchParams();
  for (const field of FIELDS) if (filter[field]) params.set(field, filter[field]);
  if (before !== null) params.set('before', String(before));
  const query = params.toString();
  return query ? `?${query}` : '';
}

/** The trail page with the same filters, from the newest event or from before the given event number. */
export const trailHref = (filter: AuditFilter, before: number | null = null) => `/admin/audit${queryOf(filter, before)}`;

/** The CSV export of every event the filters match, whichever page is shown. */
export const trailCsvHref = (filter: AuditFilter) => `/api/admin/audit/csv${queryOf(filter, null)}`;
