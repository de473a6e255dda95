import { auditTrailCsv } from '@/lib/audit/audit-trail-csv';
import { parseAuditFilter, rawQueryOf } from '@/lib/audit/parse-audit-filter';
import { InvalidRequestError } from '@/lib/http/app-errors';
import { authorizedRoute } from '@/lib/http/authorized-route';

// GET with the trail page's filters: every matching event as CSV. It names people, so it is never cached.
export const GET = authorizedRoute(['admin'], async (request) => {
  const parsed = parseAuditFilter(rawQueryOf(new URL(request.url).searchParams));
  if (!parsed.ok) throw new InvalidRequestError(parsed.issues, 'The filters of the audit trail export need attention.');
  const csv = await auditTrailCsv({ filter: { ...parsed.filter, before: null } });
  const day = new Date().toISOString().slice(0, 10);
  return new Response(csv, { headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': `attachment; filename="sillmark-audit-trail-${day}.csv"`, 'cache-control': 'private, no-store' } });
});
