import type { Metadata } from 'next';
import { requirePageRole } from '@/lib/auth/page-guard';
import { listOutbox } from '@/lib/mail/list-outbox';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Mail outbox' };

const kib = (bytes: number) => `${(bytes / 1024).toFixed(1)} KiB`;

export default async function OutboxPage() {
  await requirePageRole(['admin'], '/admin/outbox');
  const { total, messages } = await listOutbox({ limit: 100 });
  return (
    <>
      <PageHeader eyebrow="Administration" title="Mail outbox">
        {process.env.SMTP_URL
          ? 'SMTP_URL is set, so new mail goes to that provider; messages the local SMTP server received earlier are listed here.'
          : 'No SMTP_URL is set, so the portal sends its mail over SMTP to its own local server on this machine, which keeps every message here. Nothing here has left the portal.'}
      </PageHeader>
      {messages.length === 0 ? <EmptyState title="No messages yet." /> : (
        <>
          <p className="mb-4 text-sm text-ink-soft"><span className="num">{total}</span> message{total === 1 ? '' : 's'} received{total > messages.length ? `; the newest ${messages.length} are shown` : ''}.</p>
          <ul className="space-y-4">
            {messages.map((m) => (
              <li key={m.id} className="rounded border border-paper-edge bg-white/60 p-4" data-testid="outbox-message">
                <p className="font-semibold">{m.subject}</p>
                <p className="text-sm text-ink-soft">From {m.from || '(none)'} · to {m.to} · <span className="num">{m.receivedAt.replace('T', ' ').slice(0, 19)}</span> UTC · <span className="num">{kib(m.sizeBytes)}</span></p>
                {m.attachments.length ? (
                  <ul className="mt-1 text-sm">
                    {m.attachments.map((a, i) => <li key={i}>Attachment: {a.filename} <span className="text-ink-soft">({a.contentType}, <span className="num">{kib(a.sizeBytes)}</span>)</span></li>)}
                  </ul>
                ) : null}
                <details className="mt-2">
                  <summary className="cursor-pointer text-sm text-accent">Show the message text</summary>
                  <pre className="mt-2 overflow-x-auto whitespace-pre-wrap font-sans text-sm">{m.text}</pre>
                </details>
              </li>
            ))}
          </ul>
        </>
      )}
    </>
  );
}
