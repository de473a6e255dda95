import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { listAuditEvents } from '@/lib/audit/list-audit-events';
import { requirePageRole } from '@/lib/auth/page-guard';

export const metadata: Metadata = { title: 'Audit trail' };

export default async function AuditPage() {
  await requirePageRole(['admin'], '/admin/audit');
  const events = await listAuditEvents();
  return (
    <>
      <PageHeader eyebrow="Administration" title="Audit trail">Append-only: each event’s hash covers the one before it. Latest 100 events.</PageHeader>
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Audit events</caption>
        <thead>
          <tr className="border-b border-paper-edge text-left text-ink-soft">
            <th scope="col" className="py-2 pr-3">When (UTC)</th><th scope="col" className="py-2 pr-3">Who</th><th scope="col" className="py-2 pr-3">What</th><th scope="col" className="py-2 pr-3">On</th><th scope="col" className="py-2">Hash</th>
          </tr>
        </thead>
        <tbody>
          {events.map((e) => (
            <tr key={e.id} className="border-b border-paper-edge align-top">
              <td className="num py-2 pr-3">{e.at.replace('T', ' ').slice(0, 19)}</td>
              <td className="py-2 pr-3">{e.actor}</td>
              <td className="py-2 pr-3">{e.action}</td>
              <td className="py-2 pr-3">{e.entity}</td>
              <td className="num py-2 text-xs text-ink-faint" title={e.hash}>{e.hash.slice(0, 12)}…</td>
            </tr>
          ))}
        </tbody>
      </table>
    </>
  );
}
