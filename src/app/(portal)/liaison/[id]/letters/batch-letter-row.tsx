'use client';

import { useState } from 'react';
import { calendarDateIn } from '@/lib/dates/calendar-dates';
import type { BatchProgress } from '@/lib/letters/batch-progress';
import { inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { usePortalTimeZone } from '@/components/ui/time-zone-context';
import { LetterStatusLabel } from '../../_components/letter-status-label';
import { markPostedAction, resendLetterAction } from './actions';

type BatchLetter = BatchProgress['letters'][number];

/** One letter of a batch: to whom, how it goes, its state; a failed one can be tried again, one to post marked posted. */
export function BatchLetterRow({ letter, manage, busy, onChanged }: { letter: BatchLetter; manage: boolean; busy: boolean; onChanged: (resend: boolean) => void }) {
  // Today in the portal's zone: just after midnight in summer it is already tomorrow there, not yet in UTC.
  const today = calendarDateIn(usePortalTimeZone(), new Date());
  const [postedOn, setPostedOn] = useState(today);
  const [problem, setProblem] = useState<string | null>(null);
  const dateId = `posted-on-${letter.id}`;

  const resend = async () => {
    const result = await resendLetterAction({ letterId: letter.id });
    setProblem(result.ok ? null : result.error);
    if (result.ok) onChanged(true);
  };
  const markPosted = async () => {
    const result = await markPostedAction({ letterId: letter.id, postedOn });
    setProblem(result.ok ? null : (result.issues[0] ? `Posted on ${result.issues[0].message}` : result.error));
    if (result.ok) onChanged(false);
  };

  return (
    <li className="flex flex-wrap items-center justify-between gap-2 py-2" data-testid={`batch-letter-${letter.parcelReference}`}>
      <span><span className="num font-semibold">{letter.parcelReference}</span> {letter.ownerName} <span className="text-ink-soft">· {letter.recipientEmail ?? 'no e-mail: by post'}</span></span>
      <span className="flex flex-wrap items-center gap-3">
        <LetterStatusLabel status={letter.status} />
        {letter.status === 'posted' && letter.postedOn ? <span className="num text-xs text-ink-soft">{letter.postedOn}</span> : null}
        <a className="text-accent underline" href={`/api/letters/${letter.id}`} target="_blank" rel="noreferrer">PDF<span className="sr-only"> of the letter to {letter.parcelReference}</span></a>
        {manage && letter.status === 'failed' && letter.recipientEmail ? <button type="button" className="text-accent underline" disabled={busy} onClick={resend}>Try again<span className="sr-only"> the letter to {letter.parcelReference}</span></button> : null}
      </span>
      {manage && letter.status === 'to-post' ? (
        <span className="flex w-full flex-wrap items-end gap-2 text-xs">
          <label htmlFor={dateId}>Posted on<span className="sr-only"> (the letter to {letter.parcelReference})</span></label>
          <input id={dateId} type="date" value={postedOn} max={today} onChange={(e) => setPostedOn(e.target.value)} aria-invalid={problem ? true : undefined} className={`${inputClassName} max-w-[11rem] py-1`} />
          <button type="button" className="rounded border border-accent px-2 py-1 font-semibold text-accent" disabled={busy} onClick={markPosted}>Mark posted<span className="sr-only"> (the letter to {letter.parcelReference})</span></button>
        </span>
      ) : null}
      {letter.failureReason ? <span className="w-full text-xs text-verdict-fail">{letter.failureReason}</span> : null}
      {problem ? <span role="alert" className="w-full text-xs text-verdict-fail"><StatusIcon name="fail" className="mr-1" />{problem}</span> : null}
    </li>
  );
}
