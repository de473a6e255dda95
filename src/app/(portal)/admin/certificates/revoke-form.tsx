'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { type RevokeCertificateInput, revokeCertificateSchema } from '@/lib/validation/certificate-schemas';
import { FormField, inputClassName } from '@/components/ui/form-field';
import { revokeCertificateAction } from './actions';

export function RevokeForm({ certificateId, number }: { certificateId: string; number: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<RevokeCertificateInput>({ resolver: zodResolver(revokeCertificateSchema), defaultValues: { certificateId, reason: '' } });
  const field = `revoke-reason-${certificateId}`;

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const result = await revokeCertificateAction(values);
    if (result.ok) return router.refresh();
    for (const issue of result.issues) if (issue.path === 'reason') setError('reason', { message: issue.message });
    setFailure(result.error);
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Revoke certificate ${number}`}>
      {failure ? <p role="alert" className="mb-2 text-sm text-verdict-fail">✖ {failure}</p> : null}
      <FormField id={field} label={`Reason for revoking ${number}`} hint="Shown on the public verification page." error={formState.errors.reason?.message}>
        <textarea id={field} rows={2} className={inputClassName} aria-invalid={!!formState.errors.reason} {...register('reason')} />
      </FormField>
      <button type="submit" className="inline-flex items-center rounded border border-verdict-fail px-3 py-1.5 text-sm font-semibold text-verdict-fail hover:bg-paper-deep disabled:opacity-60" disabled={formState.isSubmitting}>
        <span aria-hidden="true">✖&nbsp;</span>Revoke {number}
      </button>
    </form>
  );
}
