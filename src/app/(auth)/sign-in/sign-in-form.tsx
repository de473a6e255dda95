'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { signInSchema, type SignInInput } from '@/lib/validation/auth-schemas';
import { StatusIcon } from '@/components/ui/status-icon';
import { signInAction } from './actions';

export function SignInForm({ next }: { next?: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<SignInInput>({ resolver: zodResolver(signInSchema), defaultValues: { email: '', password: '', next } });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const result = await signInAction(values);
    if (result.ok) return router.push(result.data.next);
    for (const issue of result.issues) setError(issue.path as keyof SignInInput, { message: issue.message });
    setFailure(result.error);
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-describedby={failure ? 'sign-in-failure' : undefined}>
      <h1 className="mb-4 text-xl font-semibold">Sign in</h1>
      {failure ? <p id="sign-in-failure" role="alert" className="mb-4 border-l-4 border-verdict-fail bg-paper-deep px-3 py-2 text-sm"><StatusIcon name="fail" className="mr-1" />{failure}</p> : null}
      <FormField id="email" label="E-mail address" error={formState.errors.email?.message}>
        <input id="email" type="email" autoComplete="username" className={inputClassName} aria-invalid={!!formState.errors.email} aria-describedby={formState.errors.email ? 'email-error' : undefined} {...register('email')} />
      </FormField>
      <FormField id="password" label="Password" error={formState.errors.password?.message}>
        <input id="password" type="password" autoComplete="current-password" className={inputClassName} aria-invalid={!!formState.errors.password} aria-describedby={formState.errors.password ? 'password-error' : undefined} {...register('password')} />
      </FormField>
      <button type="submit" className={buttonClassName} disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Signing in…' : 'Sign in'}</button>
    </form>
  );
}
