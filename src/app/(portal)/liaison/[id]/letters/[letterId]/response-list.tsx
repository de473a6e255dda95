'use client';

import { useState } from 'react';
import type { LetterDetail } from '@/lib/letters/load-letter';
import { RESPONSE_CHANNELS, RESPONSE_TYPES } from '@/lib/validation/letter-schemas';
import { LocalTime } from '@/components/ui/local-time';
import { ResponseForm } from './response-form';

type Response = LetterDetail['responses'][number];
const typeWords = (t: string) => RESPONSE_TYPES[t as keyof typeof RESPONSE_TYPES] ?? t;
const channelWords = (c: string) => RESPONSE_CHANNELS[c as keyof typeof RESPONSE_CHANNELS] ?? c;

/** The responses logged, each with its kind and channel, its corrections' earlier wordings, and (for the officer) Edit. */
export function ResponseList({ letterId, responses, manage }: { letterId: string; responses: Response[]; manage: boolean }) {
  const [editing, setEditing] = useState<string | null>(null);
  if (responses.length === 0) return <p className="mt-2 text-sm text-ink-soft">No response logged yet.</p>;
  return (
    <ul className="mt-2 space-y-3 text-sm">
      {responses.map((r) => (
        <li key={r.id} className="rounded border border-paper-edge bg-white/60 p-3" data-testid="letter-response">
          <p className="text-ink-soft"><span className="font-semibold text-ink">{typeWords(r.responseType)}</span> by {channelWords(r.channel).toLowerCase()}, received <span className="num">{r.receivedAt.slice(0, 10)}</span>, logged by {r.loggedBy}</p>
          <p className="mt-1 whitespace-pre-wrap">{r.summary}</p>
          {r.earlier.length > 0 ? (
            <details className="mt-2 text-xs">
              <summary className="cursor-pointer text-accent">Earlier wording ({r.earlier.length})</summary>
              <ul className="mt-1 space-y-2">
                {r.earlier.map((e) => (
                  <li key={e.editedAt} className="border-l-2 border-paper-edge pl-2">
                    <p className="text-ink-soft">Until <LocalTime iso={e.editedAt} /> (corrected by {e.editedBy}): {typeWords(e.responseType)} by {channelWords(e.channel).toLowerCase()}, received <span className="num">{e.receivedAt.slice(0, 10)}</span></p>
                    <p className="whitespace-pre-wrap">{e.summary}</p>
                  </li>
                ))}
              </ul>
            </details>
          ) : null}
          {manage ? <button type="button" className="mt-2 text-accent underline" aria-expanded={editing === r.id} onClick={() => setEditing(editing === r.id ? null : r.id)}>{editing === r.id ? 'Close the correction' : 'Edit'}<span className="sr-only"> the response received {r.receivedAt.slice(0, 10)}</span></button> : null}
          {editing === r.id ? <ResponseForm letterId={letterId} responseId={r.id} initial={{ receivedOn: r.receivedAt.slice(0, 10), responseType: r.responseType, channel: r.channel, summary: r.summary }} onDone={() => setEditing(null)} /> : null}
        </li>
      ))}
    </ul>
  );
}
