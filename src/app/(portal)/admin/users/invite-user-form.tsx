'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { ROLES, ROLE_LABELS } from '@/lib/auth/roles';
import { inviteUserSchema, type InviteUserInput } from '@/lib/validation/auth-schemas';
import { StatusIcon } from '@/components/ui/status-icon';
import { inviteUserAction } from './actions';

export function InviteUserForm() {
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<InviteUserInput>({ resolver: zodResolver(inviteUserSchema), defaultValues: { email: '', name: '', role: 'designer' } });

  const onSubmit = handleSubmit(async (values) => {
    const result = await inviteUserAction(values);
    if (result.ok) {
      reset();
      return setMessage({ ok: true, text: `Invitation sent to ${result.data.email}.` });
    }
    for (const issue of result.issues) setError(issue.path as keyof InviteUserInput, { message: issue.message });
    setMessage({ ok: false, text: result.error });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="max-w-md">
      <h2 className="mb-3 text-lg font-semibold">Invite a user</h2>
      {message ? <p role={message.ok ? 'status' : 'alert'} className="mb-3 text-sm"><StatusIcon name={message.ok ? 'pass' : 'fail'} className="mr-1" />{message.text}</p> : null}
      <FormField id="invite-name" label="Name" error={formState.errors.name?.message}>
        <input id="invite-name" className={inputClassName} {...register('name')} />
      </FormField>
      <FormField id="invite-email" label="E-mail address" error={formState.errors.email?.message}>
        <input id="invite-email" type="email" className={inputClassName} {...register('email')} />
      </FormField>
      <FormField id="invite-role" label="Role" error={formState.errors.role?.message}>
        <select id="invite-role" className={inputClassName} {...register('role')}>
          {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
        </select>
      </FormField>
      <button type="submit" className={buttonClassName} disabled={formState.isSubmitting}>Send invitation</button>
    </form>
  );
}
