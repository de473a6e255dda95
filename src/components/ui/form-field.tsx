import type { ReactNode } from 'react';
import { StatusIcon } from './status-icon';

/**
 * A labelled field with its hint, caution and error, each tied to the input by aria-describedby. The hint sits under
 * the input, so that fields side by side stay in line however long their hints are.
 */
export function FormField({ id, label, hint, caution, error, children }: { id: string; label: string; hint?: string; caution?: string; error?: string; children: ReactNode }) {
  return (
    <div className="mb-4 min-w-0">
      <label htmlFor={id} className="block text-sm font-semibold">{label}</label>
      <div className="mt-1">{children}</div>
      {error ? <p id={`${id}-error`} role="alert" className="mt-1 flex items-start gap-1 text-sm text-verdict-fail"><StatusIcon name="fail" />{error}</p> : null}
      {caution && !error ? <p id={`${id}-caution`} role="status" className="mt-1 flex items-start gap-1 text-sm text-verdict-caution"><StatusIcon name="caution" />{caution}</p> : null}
      {hint ? <p id={`${id}-hint`} className="mt-1 text-xs text-ink-faint">{hint}</p> : null}
    </div>
  );
}

export const inputClassName = 'w-full rounded border border-paper-edge bg-white px-3 py-2 text-ink shadow-sm focus:border-accent aria-[invalid=true]:border-2 aria-[invalid=true]:border-verdict-fail';
export const buttonClassName = 'inline-flex items-center rounded bg-accent px-4 py-2 font-semibold text-white hover:bg-accent-strong disabled:opacity-60';
