'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { acceptInvitationSchema, type AcceptInvitationInput } from '@/lib/validation/auth-schemas';
import { acceptInvitationAction } from './actions';

export function AcceptInvitationForm({ token }: { token: string }) {
  const [done, setDone] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<AcceptInvitationInput>({ resolver: zodResolver(acceptInvitationSchema), defaultValues: { token, password: '', confirmPassword: '' } });

  const onSubmit = handleSubmit(async (values) => {
    const result = await acceptInvitationAction(values);
    if (result.ok) return setDone(result.data.email);
    for (const issue of result.issues) setError(issue.path as keyof AcceptInvitationInput, { message: issue.message });
    setFailure(result.error);
  });

  if (done) return <p role="status">Your account {done} is ready. <Link className="text-accent underline" href="/sign-in">Sign in</Link>.</p>;
  return (
    <form onSubmit={onSubmit} noValidate>
      <h1 className="mb-4 text-xl font-semibold">Set your password</h1>
      {failure ? <p role="alert" className="mb-4 border-l-4 border-verdict-fail px-3 py-2 text-sm">{failure}</p> : null}
      <FormField id="password" label="New password" hint="At least 12 characters." error={formState.errors.password?.message}>
        <input id="password" type="password" autoComplete="new-password" className={inputClassName} {...register('password')} />
      </FormField>
      <FormField id="confirmPassword" label="The same password again" error={formState.errors.confirmPassword?.message}>
        <input id="confirmPassword" type="password" autoComplete="new-password" className={inputClassName} {...register('confirmPassword')} />
      </FormField>
      <button type="submit" className={buttonClassName} disabled={formState.isSubmitting}>Activate my account</button>
    </form>
  );
}
