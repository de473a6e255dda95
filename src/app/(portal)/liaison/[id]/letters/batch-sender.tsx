'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import useSWR from 'swr';
import type { BatchProgress } from '@/lib/letters/batch-progress';
import { buttonClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { LetterStatusLabel } from '../../_components/letter-status-label';

const LETTERS_PER_REQUEST = 3;

async function fetchProgress(url: string): Promise<BatchProgress> {
  const response = await fetch(url);
  if (!response.ok) throw new Error(((await response.json().catch(() => ({}))) as { error?: string }).error ?? `The progress could not be read (${response.status}).`);
  return response.json();
}

/**
 * A batch's progress, read with SWR, and the sending loop: each request sends a few letters and returns the new
 * progress, so the bar moves as it goes, and leaving the page only pauses the batch (send again to resume).
 */
export function BatchSender({ batchId, manage, initiallyOpen }: { batchId: string; manage: boolean; initiallyOpen: boolean }) {
  const router = useRouter();
  const url = `/api/letters/batches/${batchId}`;
  const [sending, setSending] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const { data, error, mutate } = useSWR(url, fetchProgress, { refreshInterval: (latest) => (!sending && latest?.counts.sending ? 2000 : 0) });

  const send = async (retryFailed: boolean) => {
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

  if (error) return <p role="alert" className="text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />{error.message}</p>;
  if (!data) return <p className="text-sm text-ink-soft">Reading the batch…</p>;
  const done = data.counts.sent + data.counts.acknowledged + data.counts.failed + data.counts.held;
  const retryable = data.letters.some((l) => l.status === 'failed' && l.recipientEmail);
  return (
    <section aria-label={`Batch of ${data.createdAt.slice(0, 10)}`} className="rounded border border-paper-edge bg-white/60 p-4" data-testid="letter-batch">
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <h3 className="font-semibold">
          Made <span className="num">{data.createdAt.replace('T', ' ').slice(0, 16)}</span> UTC from revision <span className="num">{data.revisionNumber}</span>
          {data.preliminary ? <span className="ml-2 text-xs font-semibold text-verdict-caution">PRELIMINARY</span> : null}
        </h3>
        <div className="flex gap-3">
          {manage && data.counts.queued > 0 ? <button type="button" className={buttonClassName} disabled={sending} onClick={() => send(false)}>{sending ? 'Sending…' : done > 0 ? 'Resume sending' : `Send ${data.total} letter${data.total === 1 ? '' : 's'}`}</button> : null}
          {manage && retryable && data.counts.queued === 0 ? <button type="button" className="rounded border border-accent px-3 py-2 text-sm font-semibold text-accent" disabled={sending} onClick={() => send(true)}>Retry the failed letters</button> : null}
        </div>
      </div>
      <div className="mt-3">
        <label htmlFor={`progress-${batchId}`} className="sr-only">Letters sent</label>
        <progress id={`progress-${batchId}`} max={data.total} value={done} className="h-2 w-full overflow-hidden rounded [&::-webkit-progress-bar]:bg-paper-deep [&::-webkit-progress-value]:bg-accent [&::-moz-progress-bar]:bg-accent" />
        <p role="status" aria-live="polite" className="mt-1 text-sm" data-testid="batch-progress">
          <span className="num">{data.counts.sent + data.counts.acknowledged}</span> of <span className="num">{data.total}</span> sent, <span className="num">{data.counts.failed}</span> failed, <span className="num">{data.counts.queued + data.counts.sending}</span> waiting.
          {data.counts.held > 0 ? <> <span className="num">{data.counts.held}</span> held and not sent: the certificate of revision <span className="num">{data.revisionNumber}</span> was revoked.</> : null}
        </p>
        {problem ? <p role="alert" className="mt-1 text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />{problem}</p> : null}
      </div>
      <details open={initiallyOpen} className="mt-3">
        <summary className="cursor-pointer text-sm text-accent">The letters of this batch</summary>
        <ul className="mt-2 divide-y divide-paper-edge text-sm">
          {data.letters.map((l) => (
            <li key={l.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <span><span className="num font-semibold">{l.parcelReference}</span> {l.ownerName} <span className="text-ink-soft">· {l.recipientEmail ?? 'no e-mail: by post'}</span></span>
              <span className="flex items-center gap-3">
                <LetterStatusLabel status={l.status} />
                <a className="text-accent underline" href={`/api/letters/${l.id}`} target="_blank" rel="noreferrer">PDF<span className="sr-only"> of the letter to {l.parcelReference}</span></a>
              </span>
              {l.failureReason ? <span className="w-full text-xs text-verdict-fail">{l.failureReason}</span> : null}
            </li>
          ))}
        </ul>
      </details>
    </section>
  );
}
