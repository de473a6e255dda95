import type { ReactNode } from 'react';

/** A labelled field with its hint and error; the error is tied to the input by aria-describedby. */
export function FormField({ id, label, hint, error, children }: { id: string; label: string; hint?: string; error?: string; children: ReactNode }) {
  return (
    <div className="mb-4">
      <label htmlFor={id} className="block text-sm font-semibold">{label}</label>
      {hint ? <p id={`${id}-hint`} className="text-xs text-ink-faint">{hint}</p> : null}
      <div className="mt-1">{children}</div>
      {error ? <p id={`${id}-error`} role="alert" className="mt-1 text-sm text-verdict-fail"><span aria-hidden="true">✖ </span>{error}</p> : null}
    </div>
  );
}

export const inputClassName = 'w-full rounded border border-paper-edge bg-white px-3 py-2 text-ink shadow-sm focus:border-accent';
export const buttonClassName = 'inline-flex items-center rounded bg-accent px-4 py-2 font-semibold text-white hover:bg-accent-strong disabled:opacity-60';
