'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { submitForCheckSchema } from '@/lib/validation/check-schemas';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { submitForCheckAction } from './actions';

type FormInput = z.input<typeof submitForCheckSchema>;
type Checker = { id: string; name: string; organisation: string | null };

/** `submittedHref`: where to go once submitted (the results sheet sends the designer to the frozen revision's record). */
export function SubmitForCheckForm({ revisionId, checkers, submittedHref, className = '' }: { revisionId: string; checkers: Checker[]; submittedHref?: string; className?: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<{ message: string; fields: string[] } | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<FormInput>({ resolver: zodResolver(submitForCheckSchema), defaultValues: { revisionId, checkerId: '' } });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const result = await submitForCheckAction(values);
    if (result.ok) return submittedHref ? router.push(submittedHref) : router.refresh();
    const checkerIssue = result.issues.find((issue) => issue.path === 'checkerId');
    if (checkerIssue) setError('checkerId', { message: checkerIssue.message });
    setFailure({ message: result.error, fields: result.issues.filter((issue) => issue !== checkerIssue).map((issue) => issue.message) });
  });

  return (
    <form onSubmit={onSubmit} noValidate className={`max-w-lg rounded border border-paper-edge bg-white/60 p-4 print:hidden ${className}`}>
      <h2 className="mb-1 text-lg font-semibold">Submit for check</h2>
      <p className="mb-3 text-sm text-ink-soft">Submitting freezes this revision: the engine evaluates it once more and its inputs, results and their SHA-256 hashes are kept unchanged from then on. The checker is told by e-mail.</p>
      {failure ? (
        <div role="alert" className="mb-3 border-l-4 border-verdict-fail bg-paper-deep px-3 py-2 text-sm">
          <p><StatusIcon name="fail" className="mr-1" />{failure.message}</p>
          {failure.fields.length ? <ul className="num mt-1 list-disc pl-5 text-xs">{failure.fields.map((f) => <li key={f}>{f}</li>)}</ul> : null}
        </div>
      ) : null}
      <FormField id="checkerId" label="Checker" hint="Choose a checker, or leave it to the queue: the first checker to take it up checks it." error={formState.errors.checkerId?.message}>
        <select id="checkerId" className={inputClassName} aria-invalid={!!formState.errors.checkerId} {...register('checkerId')}>
          <option value="">Any checker (the checkers’ queue)</option>
          {checkers.map((c) => (
            <option key={c.id} value={c.id}>{c.name}{c.organisation ? `, ${c.organisation}` : ''}</option>
          ))}
        </select>
      </FormField>
      <button type="submit" className={buttonClassName} disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Submitting…' : 'Submit for check'}</button>
    </form>
  );
}
