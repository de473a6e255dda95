'use client';

import { useEffect, useRef } from 'react';
import { buttonClassName } from './form-field';

/**
 * An inline confirmation: says what will happen (with the count), takes the focus so a keyboard user lands on it,
 * and does nothing until its confirm button is pressed. Escape or Cancel closes it.
 */
export function ConfirmPanel({ id, question, confirmLabel, onConfirm, onCancel, tone = 'normal' }: { id: string; question: string; confirmLabel: string; onConfirm: () => void; onCancel: () => void; tone?: 'normal' | 'danger' }) {
  const panel = useRef<HTMLDivElement>(null);
  useEffect(() => panel.current?.focus(), []);
  return (
    <div ref={panel} id={id} role="group" aria-labelledby={`${id}-question`} tabIndex={-1} onKeyDown={(e) => e.key === 'Escape' && onCancel()} className={`mt-3 rounded border-l-4 bg-paper-deep px-3 py-2 text-sm outline-none focus-visible:ring-2 focus-visible:ring-accent ${tone === 'danger' ? 'border-verdict-fail' : 'border-accent'}`}>
      <p id={`${id}-question`} className="font-semibold">{question}</p>
      <div className="mt-2 flex flex-wrap gap-3">
        <button type="button" className={buttonClassName} onClick={onConfirm}>{confirmLabel}</button>
        <button type="button" className="rounded border border-paper-edge px-3 py-2 text-sm" onClick={onCancel}>Cancel</button>
      </div>
    </div>
  );
}
