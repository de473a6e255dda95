import type { Metadata } from 'next';
import Link from 'next/link';
import { auditTrailView } from '@/lib/audit/audit-trail-view';
import { AUDIT_PAGE_SIZE } from '@/lib/audit/list-audit-events';
import type { RawQuery } from '@/lib/audit/parse-audit-filter';
import { requirePageRole } from '@/lib/auth/page-guard';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { StatusIcon } from '@/components/ui/status-icon';
import { AuditChainStatus } from './audit-chain-status';
import { AuditEventList } from './audit-event-list';
import { AuditFilterForm } from './audit-filter-form';
import { trailCsvHref, trailHref } from './audit-links';

export const metadata: Metadata = { title: 'Audit trail' };

export default async function AuditPage({ searchParams }: { searchParams: Promise<RawQuery> }) {
  await requirePageRole(['admin'], '/admin/audit');
  const raw = await searchParams;
  const view = await auditTrailView(raw);
  return (
    <>
      <PageHeader eyebrow="Administration" title="Audit trail">Append-only: each event’s hash covers the one before it, and every hash is recomputed each time this page is shown.</PageHeader>
      <AuditChainStatus check={view.chain} alarm={view.chainAlarm} />
      <AuditFilterForm values={raw} issues={view.issues} choices={view} />
      {view.issues.length ? (
        <p role="alert" className="mb-4 text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />The filters above need attention, so no events are shown.</p>
      ) : view.entries.length === 0 ? (
        <EmptyState title="No event matches these filters." />
      ) : (
        <>
          <p role="status" className="mb-2 text-sm text-ink-soft">
            Showing <span className="num">{view.entries.length}</span> event(s), newest first, {view.filter?.before ? `older than event ${view.filter.before}` : 'from the latest'}; {AUDIT_PAGE_SIZE} to a page.{' '}
            <a className="text-accent underline" href={trailCsvHref(view.filter!)}>Download every matching event as CSV</a>
          </p>
          <AuditEventList entries={view.entries} />
        </>
      )}
      {view.filter && (view.filter.before !== null || view.olderBefore !== null) ? (
        <nav aria-label="Pages of the audit trail" className="mt-4 flex flex-wrap items-center gap-4 text-sm">
          {view.filter.before !== null ? <Link className="text-accent underline" href={trailHref(view.filter)}>← Newest events</Link> : null}
          {view.olderBefore !== null ? <Link className="text-accent underline" href={trailHref(view.filter, view.olderBefore)}>Older events →</Link> : null}
        </nav>
      ) : null}
    </>
  );
}
