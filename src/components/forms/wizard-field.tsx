import type { ReactNode } from 'react';
import { FormField } from '@/components/ui/form-field';

/**
 * A labelled wizard field whose error reads as a sentence: the schema says "must be greater than 0 m",
 * the field adds its own name, "Bottom width must be greater than 0 m".
 */
export function WizardField({ id, label, noun, hint, error, children }: { id: string; label: string; noun?: string; hint?: string; error?: string; children: ReactNode }) {
  const subject = noun ?? label.replace(/\s*\(.*\)$/, '');
  return (
    <FormField id={id} label={label} hint={hint} error={error ? `${subject} ${error}` : undefined}>
      {children}
    </FormField>
  );
}

/** aria attributes that tie an input to its hint and error. */
export function describedBy(id: string, { hint, error }: { hint?: string; error?: string }) {
  const ids = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ');
  return { 'aria-invalid': error ? true : undefined, 'aria-describedby': ids || undefined } as const;
}
