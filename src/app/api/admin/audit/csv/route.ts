import { exportAuditTrail } from '@/lib/audit/export-audit-trail';
import { parseAuditFilter, rawQueryOf } from '@/lib/audit/parse-audit-filter';
import { InvalidRequestError } from '@/lib/http/app-errors';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { isPrefetch } from '@/lib/http/is-prefetch';

const NO_STORE = 'private, no-store';

// GET with the trail page's filters: every matching event as CSV. It names people, so it is never cached; a
// prefetch gets nothing and logs nothing, since each export a person asks for is itself an audit event.
export const GET = authorizedRoute(['admin'], async (request, admin) => {
  if (isPrefetch(request)) return new Response(null, { status: 204, headers: { 'cache-control': NO_STORE, vary: 'Next-Router-Prefetch, Purpose, Sec-Purpose' } });
  const parsed = parseAuditFilter(rawQueryOf(new URL(request.url).searchParams));
  if (!parsed.ok) throw new InvalidRequestError(parsed.issues, 'The filters of the audit trail export need attention.');
  const csv = await exportAuditTrail({ filter: parsed.filter, admin });
  const day = new Date().toISOString().slice(0, 10);
  return new Response(csv, { headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': `attachment; filename="sillmark-audit-trail-${day}.csv"`, 'cache-control': NO_STORE } });
});
