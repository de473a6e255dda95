import type { Metadata } from 'next';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageRole } from '@/lib/auth/page-guard';
import { listOutbox } from '@/lib/mail/list-outbox';

export const metadata: Metadata = { title: 'Mail outbox' };

export default async function OutboxPage() {
  await requirePageRole(['admin'], '/admin/outbox');
  const messages = await listOutbox();
  return (
    <>
      <PageHeader eyebrow="Administration" title="Mail outbox">Messages kept on this machine because no SMTP_URL is set. Nothing here has left the portal.</PageHeader>
      {messages.length === 0 ? <EmptyState title="No messages yet." /> : (
        <ul className="space-y-4">
          {messages.map((m) => (
            <li key={m.id} className="rounded border border-paper-edge bg-white/60 p-4">
              <p className="font-semibold">{m.subject}</p>
              <p className="text-sm text-ink-soft">To {m.to} · <span className="num">{m.receivedAt.replace('T', ' ').slice(0, 19)}</span> UTC · <span className="num">{m.sizeBytes}</span> bytes</p>
              <details className="mt-2"><summary className="cursor-pointer text-sm text-accent">Show the message</summary><pre className="mt-2 overflow-x-auto whitespace-pre-wrap text-xs">{m.raw}</pre></details>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
