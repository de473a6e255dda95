import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageRole } from '@/lib/auth/page-guard';
import { listCheckQueue } from '@/lib/review/list-check-queue';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { StatusLabel } from '@/components/ui/status-label';
import { portalTime } from '@/lib/dates/portal-time';

export const metadata: Metadata = { title: 'Checks' };

export default async function ChecksPage() {
  const checker = await requirePageRole(['checker'], '/checks');
  const queue = await listCheckQueue(checker);
  return (
    <>
      <PageHeader eyebrow="Independent check" title="Checks">Revisions submitted to you or to the checkers’ queue. Your own designs never appear here.</PageHeader>
      <section aria-labelledby="h-waiting">
        <h2 id="h-waiting" className="mb-3 text-lg font-semibold">Waiting for check</h2>
        {queue.waiting.length === 0 ? (
          <EmptyState title="No revision is waiting for your check." />
        ) : (
          <ul className="divide-y divide-paper-edge rounded border border-paper-edge bg-white/60">
            {queue.waiting.map((r) => (
              <li key={r.id} className="flex flex-wrap items-center justify-between gap-3 px-4 py-3">
                <div>
                  <Link href={`/checks/${r.id}`} className="font-semibold text-accent underline">{r.scheme.reference} {r.scheme.name} — revision {r.number}</Link>
                  <p className="text-sm text-ink-soft">{r.scheme.watercourse} at {r.scheme.site} · by {r.author} · submitted <span className="num">{portalTime(r.submittedAt)}</span></p>
                </div>
                <span className="text-sm">{r.assignedToMe ? 'Assigned to you' : 'In the queue'}</span>
              </li>
            ))}
          </ul>
        )}
      </section>
      <section aria-labelledby="h-decided" className="mt-10">
        <h2 id="h-decided" className="mb-3 text-lg font-semibold">Your recent decisions</h2>
        {queue.decided.length === 0 ? (
          <EmptyState title="You have not decided on any revision yet." />
        ) : (
          <ul className="divide-y divide-paper-edge rounded border border-paper-edge bg-white/60">
            {queue.decided.map((r) => (
              <li key={`${r.id}-${r.decidedAt}`} className="flex flex-wrap items-center justify-between gap-3 px-4 py-3">
                <Link href={`/revisions/${r.id}`} className="text-accent underline">{r.scheme.reference} {r.scheme.name} — revision {r.number}</Link>
                <span className="flex items-center gap-2 text-sm">{r.decision ? <StatusLabel status={r.decision} /> : null}<span className="num text-ink-faint">{portalTime(r.decidedAt)}</span></span>
              </li>
            ))}
          </ul>
        )}
      </section>
    </>
  );
}
