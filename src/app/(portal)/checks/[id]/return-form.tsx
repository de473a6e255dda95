'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { type ReturnRevisionInput, returnRevisionSchema } from '@/lib/validation/check-schemas';
import { FormField, inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { returnRevisionAction } from './actions';

export function ReturnForm({ revisionId }: { revisionId: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<ReturnRevisionInput>({ resolver: zodResolver(returnRevisionSchema), defaultValues: { revisionId, summary: '' } });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const result = await returnRevisionAction(values);
    if (result.ok) return router.push('/checks');
    for (const issue of result.issues) if (issue.path === 'summary') setError('summary', { message: issue.message });
    setFailure(result.error);
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="h-return" className="rounded border border-paper-edge bg-white/60 p-4">
      <h3 id="h-return" className="mb-1 font-semibold">Return to the designer</h3>
      <p className="mb-3 text-sm text-ink-soft">The designer receives your comments and this summary by e-mail and revises in a new draft.</p>
      {failure ? <p role="alert" className="mb-2 text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />{failure}</p> : null}
      <FormField id="return-summary" label="What should change" error={formState.errors.summary?.message}>
        <textarea id="return-summary" rows={3} className={inputClassName} aria-invalid={!!formState.errors.summary} {...register('summary')} />
      </FormField>
      <button type="submit" className="inline-flex items-center rounded border border-verdict-caution px-4 py-2 font-semibold text-verdict-caution hover:bg-paper-deep disabled:opacity-60" disabled={formState.isSubmitting}>
        <StatusIcon name="returned" className="mr-1" />Return with comments
      </button>
    </form>
  );
}
