'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import useSWR from 'swr';
import { calendarDateIn } from '@/lib/dates/calendar-dates';
import type { BatchProgress } from '@/lib/letters/batch-progress';
import { buttonClassName } from '@/components/ui/form-field';
import { ConfirmPanel } from '@/components/ui/confirm-panel';
import { StatusIcon } from '@/components/ui/status-icon';
import { usePortalTimeZone } from '@/components/ui/time-zone-context';
import { withdrawBatchAction } from './actions';
import { BatchLetterRow } from './batch-letter-row';
import { BatchSummary } from './batch-summary';

const LETTERS_PER_REQUEST = 3;
const plural = (n: number, one: string) => `${n} ${one}${n === 1 ? '' : 's'}`;

async function fetchProgress(url: string): Promise<BatchProgress> {
  const response = await fetch(url);
  if (!response.ok) throw new Error(((await response.json().catch(() => ({}))) as { error?: string }).error ?? `The progress could not be read (${response.status}).`);
  return response.json();
}

/**
 * A batch's progress, read with SWR, and the sending loop: each request sends a few letters and returns the new
 * progress, so the bar moves as it goes, and leaving the page only pauses the batch (send again to resume). Sending
 * and withdrawing each ask for confirmation, with the count, first.
 */
export function BatchSender({ batchId, manage, initiallyOpen }: { batchId: string; manage: boolean; initiallyOpen: boolean }) {
  const timeZone = usePortalTimeZone();
  const router = useRouter();
  const url = `/api/letters/batches/${batchId}`;
  const [sending, setSending] = useState(false);
  const [confirming, setConfirming] = useState<'send' | 'withdraw' | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const { data, error, mutate } = useSWR(url, fetchProgress, { refreshInterval: (latest) => (!sending && latest?.counts.sending ? 2000 : 0) });

  const send = async (retryFailed: boolean) => {
    setConfirming(null);
    setSending(true);
    setProblem(null);
    try {
      for (let first = true; ; first = false) {
        const response = await fetch(`${url}/send`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ max: LETTERS_PER_REQUEST, retryFailed: retryFailed && first }) });
        const body = await response.json();
        if (!response.ok) {
          setProblem(body.error ?? `Sending stopped (${response.status}).`);
          break;
        }
        await mutate(body as BatchProgress, { revalidate: false });
        if (body.counts.queued === 0 && body.counts.sending === 0) break;
      }
    } catch {
      setProblem('The connection to the portal was lost. Send again to resume: letters already sent are never sent twice.');
    } finally {
      setSending(false);
      await mutate();
      router.refresh();
    }
  };

  const withdraw = async () => {
    setConfirming(null);
    const result = await withdrawBatchAction({ batchId });
    setProblem(result.ok ? null : result.error);
    await mutate();
    router.refresh();
  };

  if (error) return <p role="alert" className="text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />{error.message}</p>;
  if (!data) return <p className="text-sm text-ink-soft">Reading the batch…</p>;
  const { counts } = data;
  const byEmail = data.total - counts['to-post'] - counts.posted - counts.withdrawn;
  const done = counts.sent + counts.acknowledged + counts.failed + counts.held;
  const retryable = data.letters.some((l) => l.status === 'failed' && l.recipientEmail);
  const gone = counts.sending + counts.sent + counts.acknowledged + counts.posted;
  const open = data.status !== 'withdrawn';
  return (
    <section aria-label={`Batch of ${calendarDateIn(timeZone, data.createdAt)}`} className="rounded border border-paper-edge bg-white/60 p-4" data-testid="letter-batch">
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <BatchSummary data={data} />
        <div className="flex flex-wrap gap-3">
          {manage && open && counts.queued > 0 ? <button type="button" className={buttonClassName} disabled={sending} aria-expanded={confirming === 'send'} onClick={() => setConfirming('send')}>{sending ? 'Sending…' : done > 0 ? 'Resume sending' : `Send ${plural(counts.queued, 'letter')}`}</button> : null}
          {manage && retryable && counts.queued === 0 ? <button type="button" className="rounded border border-accent px-3 py-2 text-sm font-semibold text-accent" disabled={sending} onClick={() => send(true)}>Retry the failed letters</button> : null}
          {manage && open && counts['to-post'] > 0 ? <a className="rounded border border-accent px-3 py-2 text-sm font-semibold text-accent" href={`${url}/print`} target="_blank" rel="noreferrer">Print the {plural(counts['to-post'], 'letter')} to post</a> : null}
          {manage && open && gone === 0 ? <button type="button" className="rounded border border-verdict-fail px-3 py-2 text-sm text-verdict-fail" disabled={sending} aria-expanded={confirming === 'withdraw'} onClick={() => setConfirming('withdraw')}>Withdraw this batch</button> : null}
        </div>
      </div>
      {confirming === 'send' ? <ConfirmPanel id={`confirm-send-${batchId}`} question={`Send ${plural(counts.queued, 'letter')} by e-mail now? Each landowner gets their letter as a PDF; this cannot be undone.`} confirmLabel={`Yes, e-mail ${plural(counts.queued, 'letter')}`} onConfirm={() => send(false)} onCancel={() => setConfirming(null)} /> : null}
      {confirming === 'withdraw' ? <ConfirmPanel tone="danger" id={`confirm-withdraw-${batchId}`} question={`Withdraw this batch of ${plural(data.total, 'letter')}? None has gone out; the letters are kept, marked withdrawn, and never sent.`} confirmLabel="Yes, withdraw the batch" onConfirm={withdraw} onCancel={() => setConfirming(null)} /> : null}
      <div className="mt-3">
        <label htmlFor={`progress-${batchId}`} className="sr-only">Letters sent</label>
        <progress id={`progress-${batchId}`} max={Math.max(byEmail, 1)} value={done} className="h-2 w-full overflow-hidden rounded [&::-webkit-progress-bar]:bg-paper-deep [&::-webkit-progress-value]:bg-accent [&::-moz-progress-bar]:bg-accent" />
        <p role="status" aria-live="polite" className="mt-1 text-sm" data-testid="batch-progress">
          {open ? (
            <>
              <span className="num">{counts.sent + counts.acknowledged}</span> of <span className="num">{byEmail}</span> sent, <span className="num">{counts.failed}</span> failed, <span className="num">{counts.queued + counts.sending}</span> waiting.
              {counts['to-post'] + counts.posted > 0 ? <> <span className="num">{counts['to-post']}</span> to post, <span className="num">{counts.posted}</span> posted.</> : null}
            </>
          ) : <>Withdrawn before sending: none of its <span className="num">{data.total}</span> letters went out.</>}
          {counts.held > 0 ? <> <span className="num">{counts.held}</span> held and not sent: the certificate of revision <span className="num">{data.revisionNumber}</span> was revoked.</> : null}
        </p>
        {problem ? <p role="alert" className="mt-1 text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />{problem}</p> : null}
      </div>
      <details open={initiallyOpen} className="mt-3">
        <summary className="cursor-pointer text-sm text-accent">The letters of this batch</summary>
        <ul className="mt-2 divide-y divide-paper-edge text-sm">
          {data.letters.map((l) => <BatchLetterRow key={l.id} letter={l} manage={manage} busy={sending} onChanged={(resend) => (resend ? send(false) : mutate().then(() => router.refresh()))} />)}
        </ul>
      </details>
    </section>
  );
}
