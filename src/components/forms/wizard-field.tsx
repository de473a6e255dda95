import type { ReactNode } from 'react';
import { FormField } from '@/components/ui/form-field';

/**
 * A labelled wizard field whose error reads as a sentence: the schema says "must be greater than 0 m",
 * the field adds its own name, "Bottom width must be greater than 0 m".
 */
export function WizardField({ id, label, noun, hint, caution, error, children }: { id: string; label: string; noun?: string; hint?: string; caution?: string; error?: string; children: ReactNode }) {
  const subject = noun ?? label.replace(/\s*\(.*\)$/, '');
  return (
    <FormField id={id} label={label} hint={hint} caution={caution} error={error ? `${subject} ${error}` : undefined}>
      {children}
    </FormField>
  );
}

/** aria attributes that tie an input to its hint, caution and error. */
export function describedBy(id: string, { hint, caution, error }: { hint?: string; caution?: string; error?: string }) {
  const ids = [error ? `${id}-error` : null, caution && !error ? `${id}-caution` : null, hint ? `${id}-hint` : null].filter(Boolean).join(' ');
  return { 'aria-invalid': error ? true : undefined, 'aria-describedby': ids || undefined } as const;
}
