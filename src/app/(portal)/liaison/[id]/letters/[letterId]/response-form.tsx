'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { type LogResponseInput, logResponseSchema } from '@/lib/validation/letter-schemas';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { logLetterResponseAction } from './actions';

export function ResponseForm({ letterId }: { letterId: string }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<LogResponseInput>({ resolver: zodResolver(logResponseSchema), defaultValues: { letterId, receivedOn: new Date().toISOString().slice(0, 10), summary: '' } });

  const onSubmit = handleSubmit(async (values) => {
    const result = await logLetterResponseAction(values);
    if (result.ok) {
      reset({ letterId, receivedOn: values.receivedOn, summary: '' });
      setMessage({ ok: true, text: 'Response logged; the letter is marked acknowledged.' });
      return router.refresh();
    }
    for (const issue of result.issues) setError(issue.path as keyof LogResponseInput, { message: issue.message });
    setMessage({ ok: false, text: result.error });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="mt-6">
      <h3 className="mb-2 font-semibold">Log a response</h3>
      {message ? <p role={message.ok ? 'status' : 'alert'} className={`mb-3 text-sm ${message.ok ? 'text-verdict-pass' : 'text-verdict-fail'}`}><StatusIcon name={message.ok ? 'pass' : 'fail'} className="mr-1" />{message.text}</p> : null}
      <FormField id="response-received" label="Received on" error={formState.errors.receivedOn?.message}>
        <input id="response-received" type="date" className={inputClassName} aria-invalid={formState.errors.receivedOn ? true : undefined} {...register('receivedOn')} />
      </FormField>
      <FormField id="response-summary" label="What the landowner said" hint="A summary; keep letters and e-mails in the file." error={formState.errors.summary?.message}>
        <textarea id="response-summary" rows={4} className={inputClassName} aria-describedby="response-summary-hint" aria-invalid={formState.errors.summary ? true : undefined} {...register('summary')} />
      </FormField>
      <button type="submit" className={buttonClassName} disabled={formState.isSubmitting}>Log the response</button>
    </form>
  );
}
