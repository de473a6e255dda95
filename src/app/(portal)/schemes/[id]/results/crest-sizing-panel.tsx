'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { buttonClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { adoptSizedCrestAction } from '../actions';

type Governing = { margin: number; event: string; limit: string };
type Props = { revisionId: string; vary: 'sillHeight' | 'crestLength'; value: number | null; reason: string; governing: Governing | null; current: number | null; lengthUnit: string; editable: boolean };

/** The engine's sized crest, and the button that writes it into the draft's structure. */
export function CrestSizingPanel({ revisionId, vary, value, reason, governing, current, lengthUnit: u, editable }: Props) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const what = vary === 'sillHeight' ? 'sill height' : 'crest length';
  const adopted = value !== null && current !== null && Math.abs(current - value) < 1e-9;
  return (
    <div className="rounded border border-paper-edge bg-white/70 p-4" data-testid="crest-sizing">
      <p className="text-sm">
        {vary === 'sillHeight' ? 'Highest sill that passes every limit in every event' : 'Shortest crest that passes every limit in every event'}:{' '}
        <strong className="num text-base">{value === null ? 'none in the range searched' : `${value.toFixed(3)} ${u}`}</strong>
      </p>
      {governing ? <p className="text-sm" data-testid="sizing-governing">Governed by <strong>{governing.limit}</strong> in <strong>{governing.event}</strong>, margin <span className="num">{governing.margin.toFixed(3)} {u}</span> at the sized value.</p> : null}
      <p className="text-xs text-ink-faint">{reason}. The {what} in the draft now: <span className="num">{current === null ? '—' : `${current.toFixed(3)} ${u}`}</span>.</p>
      {adopted ? <p role="status" className="mt-2 text-sm text-verdict-pass"><StatusIcon name="pass" className="mr-1" />The draft already uses this {what}.</p> : null}
      {editable && value !== null && !adopted ? (
        <button
          type="button"
          className={`${buttonClassName} mt-3`}
          disabled={pending}
          onClick={() => startTransition(async () => {
            const result = await adoptSizedCrestAction({ revisionId });
            setMessage(result.ok ? { ok: true, text: `Adopted: ${what} ${result.data.to} ${u}. The results below are recomputed with it.` } : { ok: false, text: result.error });
            if (result.ok) router.refresh();
          })}
        >
          {pending ? 'Adopting…' : `Adopt ${value.toFixed(3)} ${u} as the ${what}`}
        </button>
      ) : null}
      {message ? <p role={message.ok ? 'status' : 'alert'} className={`mt-2 text-sm ${message.ok ? 'text-verdict-pass' : 'text-verdict-fail'}`}><StatusIcon name={message.ok ? 'pass' : 'fail'} className="mr-1" />{message.text}</p> : null}
    </div>
  );
}
