import type { Metadata } from 'next';
import { z } from 'zod';
import { portalTimeZone } from '@/lib/config/portal-time-zone';
import { localDateTime } from '@/lib/dates/calendar-dates';
import { readQuery } from '@/lib/http/query-params';
import { requirePageRole } from '@/lib/auth/page-guard';
import { listOutbox } from '@/lib/mail/list-outbox';
import { EmptyState } from '@/components/ui/empty-state';
import { buttonClassName, inputClassName } from '@/components/ui/form-field';
import { LinkedText } from '@/components/ui/linked-text';
import { PageHeader } from '@/components/ui/page-header';
import { StatusIcon } from '@/components/ui/status-icon';

export const metadata: Metadata = { title: 'Mail outbox' };

const kib = (bytes: number) => `${(bytes / 1024).toFixed(1)} KiB`;

const searchQuery = z.object({ q: z.string().trim().max(200, { error: 'must be at most 200 characters (the search)' }).optional() });

export default async function OutboxPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageRole(['admin'], '/admin/outbox');
  const read = readQuery(searchQuery, await searchParams);
  const q = read.ok ? read.data.q || undefined : undefined;
  const { total, messages } = await listOutbox({ limit: 100, q });
  const timeZone = portalTimeZone();
  return (
    <>
      <PageHeader eyebrow="Administration" title="Mail outbox">
        {process.env.SMTP_URL
          ? 'SMTP_URL is set, so new mail goes to that provider; messages the local SMTP server received earlier are listed here.'
          : 'No SMTP_URL is set, so the portal sends its mail over SMTP to its own local server on this machine, which keeps every message here. Nothing here has left the portal.'}
      </PageHeader>
      <form method="get" role="search" className="mb-6 flex flex-wrap items-end gap-3">
        <div>
          <label htmlFor="outbox-q" className="block text-sm font-semibold">Search subject, sender and recipient</label>
          <input id="outbox-q" name="q" type="search" defaultValue={q ?? ''} maxLength={200} aria-invalid={read.ok ? undefined : true} aria-describedby={read.ok ? undefined : 'outbox-q-error'} className={inputClassName} />
          {read.ok ? null : <p id="outbox-q-error" role="alert" className="mt-1 text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />The search {read.issues[0]?.message.replace(/ \(the search\)$/, '')}.</p>}
        </div>
        <button type="submit" className={buttonClassName}>Search</button>
        {q ? <a className="text-sm text-accent underline" href="/admin/outbox">Show all</a> : null}
      </form>
      {messages.length === 0 ? <EmptyState title={q ? 'No message matches the search.' : 'No messages yet.'} /> : (
        <>
          <p className="mb-4 text-sm text-ink-soft"><span className="num">{total}</span> message{total === 1 ? '' : 's'} {q ? 'match' : 'received'}{total > messages.length ? `; the newest ${messages.length} are shown` : ''}.</p>
          <ul className="space-y-4">
            {messages.map((m) => (
              <li key={m.id} className="rounded border border-paper-edge bg-white/60 p-4" data-testid="outbox-message">
                <p className="font-semibold">{m.subject}</p>
                <p className="text-sm text-ink-soft">From {m.fromHeader || m.from || '(none)'} · to {m.to}{m.replyTo ? <> · Reply-To {m.replyTo}</> : null} · <span className="num">{localDateTime(timeZone, m.receivedAt)}</span> · <span className="num">{kib(m.sizeBytes)}</span></p>
                {m.attachments.length ? (
                  <ul className="mt-1 text-sm">
                    {m.attachments.map((a, i) => <li key={i}>Attachment: <a className="text-accent underline" href={`/api/admin/outbox/${m.id}/attachment?n=${i}`} target="_blank" rel="noreferrer">{a.filename}</a> <span className="text-ink-soft">({a.contentType}, <span className="num">{kib(a.sizeBytes)}</span>)</span></li>)}
                  </ul>
                ) : null}
                <details className="mt-2">
                  <summary className="cursor-pointer text-sm text-accent">Show the message text</summary>
                  <pre className="mt-2 overflow-x-auto whitespace-pre-wrap font-sans text-sm"><LinkedText text={m.text} /></pre>
                </details>
              </li>
            ))}
          </ul>
        </>
      )}
    </>
  );
}
