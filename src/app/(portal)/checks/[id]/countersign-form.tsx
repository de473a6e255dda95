'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { countersignSchema } from '@/lib/validation/check-schemas';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { countersignRevisionAction } from './actions';

type FormInput = z.input<typeof countersignSchema>;

/** Countersigning asks for the password again and an explicit statement; the server re-checks everything. */
export function CountersignForm({ revisionId, blocked }: { revisionId: string; blocked: boolean }) {
  const router = useRouter();
  const [outcome, setOutcome] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<FormInput>({ resolver: zodResolver(countersignSchema), defaultValues: { revisionId, password: '' } });

  const onSubmit = handleSubmit(async (values) => {
    setOutcome(null);
    const result = await countersignRevisionAction(values);
    if (result.ok) {
      setOutcome({ ok: true, text: `Countersigned. Certificate ${result.data.certificateNumber} is issued.` });
      return router.push(`/revisions/${revisionId}`);
    }
    const placed = result.issues.filter((issue) => issue.path === 'password' || issue.path === 'confirmed');
    for (const issue of placed) setError(issue.path as 'password' | 'confirmed', { message: issue.message });
    // Said once: a wrong password is told at the password field, not again above the form.
    if (placed.length === 0 || placed.length < result.issues.length) setOutcome({ ok: false, text: result.error });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="h-countersign" className="rounded border border-accent bg-white/60 p-4">
      <h3 id="h-countersign" className="mb-1 font-semibold">Countersign and issue the certificate</h3>
      <p className="mb-3 text-sm text-ink-soft">The server re-runs the frozen inputs once more; the certificate is signed digitally and the scheme’s earlier certificate, if any, is superseded.</p>
      {outcome ? <p role={outcome.ok ? 'status' : 'alert'} className={`mb-2 flex items-start gap-1 text-sm ${outcome.ok ? 'text-verdict-pass' : 'text-verdict-fail'}`}><StatusIcon name={outcome.ok ? 'pass' : 'fail'} />{outcome.text}</p> : null}
      <div className="mb-4">
        <label className="flex items-start gap-2 text-sm">
          <input type="checkbox" className="mt-1" aria-invalid={!!formState.errors.confirmed} aria-describedby={formState.errors.confirmed ? 'countersign-confirmed-error' : undefined} {...register('confirmed')} />
          <span>I have checked this revision independently, I am not its designer, and I countersign it.</span>
        </label>
        {formState.errors.confirmed ? <p id="countersign-confirmed-error" role="alert" className="mt-1 flex items-start gap-1 text-sm text-verdict-fail"><StatusIcon name="fail" />{formState.errors.confirmed.message}</p> : null}
      </div>
      <FormField id="countersign-password" label="Your password" hint="The password you sign in with." error={formState.errors.password?.message}>
        <input id="countersign-password" type="password" autoComplete="current-password" className={inputClassName} aria-invalid={!!formState.errors.password} aria-describedby={formState.errors.password ? 'countersign-password-error' : 'countersign-password-hint'} {...register('password')} />
      </FormField>
      <button type="submit" className={buttonClassName} disabled={blocked || formState.isSubmitting}>{formState.isSubmitting ? 'Countersigning…' : 'Countersign'}</button>
      {blocked ? <p className="mt-2 text-sm text-verdict-fail">Countersigning is blocked: see the re-run above.</p> : null}
    </form>
  );
}
