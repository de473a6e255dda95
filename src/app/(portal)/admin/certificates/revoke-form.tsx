'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { revokeCertificateSchema } from '@/lib/validation/certificate-schemas';
import { FormField, inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { revokeCertificateAction } from './actions';

type FormInput = z.input<typeof revokeCertificateSchema>;
const FIELDS = ['reason', 'confirmed', 'password'] as const;

/** Revoking asks for the reason, an explicit confirmation and the administrator's password; the server re-checks all three. */
export function RevokeForm({ certificateId, number }: { certificateId: string; number: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<FormInput>({ resolver: zodResolver(revokeCertificateSchema), defaultValues: { certificateId, reason: '', password: '' } });
  const id = (name: string) => `revoke-${name}-${certificateId}`;

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const result = await revokeCertificateAction(values);
    if (result.ok) return router.refresh();
    for (const issue of result.issues) if ((FIELDS as readonly string[]).includes(issue.path)) setError(issue.path as (typeof FIELDS)[number], { message: issue.message });
    setFailure(result.error);
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Revoke certificate ${number}`}>
      {failure ? <p role="alert" className="mb-2 text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />{failure}</p> : null}
      <FormField id={id('reason')} label={`Reason for revoking ${number}`} hint="Shown on the public verification page, the scheme’s pages and the liaison pages." error={formState.errors.reason?.message}>
        <textarea id={id('reason')} rows={2} className={inputClassName} aria-invalid={!!formState.errors.reason} {...register('reason')} />
      </FormField>
      <div className="mb-3">
        <label className="flex items-start gap-2 text-sm">
          <input type="checkbox" className="mt-1" aria-invalid={!!formState.errors.confirmed} aria-describedby={formState.errors.confirmed ? id('confirmed-error') : undefined} {...register('confirmed')} />
          <span>I revoke certificate {number} for good. Its letters waiting to be sent are held, and no new letter can be made from its revision.</span>
        </label>
        {formState.errors.confirmed ? <p id={id('confirmed-error')} role="alert" className="mt-1 text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />{formState.errors.confirmed.message}</p> : null}
      </div>
      <FormField id={id('password')} label="Your password" hint="The password you sign in with." error={formState.errors.password?.message}>
        <input id={id('password')} type="password" autoComplete="current-password" className={inputClassName} aria-invalid={!!formState.errors.password} {...register('password')} />
      </FormField>
      <button type="submit" className="inline-flex items-center rounded border border-verdict-fail px-3 py-1.5 text-sm font-semibold text-verdict-fail hover:bg-paper-deep disabled:opacity-60" disabled={formState.isSubmitting}>
        <StatusIcon name="fail" className="mr-1" />Revoke {number}
      </button>
    </form>
  );
}
