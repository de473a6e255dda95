'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { calendarDateIn } from '@/lib/dates/calendar-dates';
import { type LogResponseInput, RESPONSE_CHANNELS, RESPONSE_TYPES, logResponseSchema } from '@/lib/validation/letter-schemas';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { usePortalTimeZone } from '@/components/ui/time-zone-context';
import { editLetterResponseAction, logLetterResponseAction } from './actions';

type Values = Omit<LogResponseInput, 'letterId'>;

/** Logs a new response, or (given `responseId`) corrects one, keeping its earlier wording. */
export function ResponseForm({ letterId, responseId, initial, onDone }: { letterId: string; responseId?: string; initial?: Values; onDone?: () => void }) {
  const router = useRouter();
  const timeZone = usePortalTimeZone();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const blank: Values = { receivedOn: calendarDateIn(timeZone, new Date()), responseType: 'no-objection', channel: 'email', summary: '' };
  const { register, handleSubmit, setError, reset, formState } = useForm<LogResponseInput>({ resolver: zodResolver(logResponseSchema), defaultValues: { letterId, ...(initial ?? blank) } });
  const prefix = responseId ? `edit-${responseId}` : 'response';

  const onSubmit = handleSubmit(async ({ letterId: _letter, ...values }) => {
    const result = responseId ? await editLetterResponseAction({ responseId, ...values }) : await logLetterResponseAction({ letterId, ...values });
    if (result.ok) {
      if (!responseId) reset({ letterId, ...blank, receivedOn: values.receivedOn });
      setMessage({ ok: true, text: responseId ? 'Response corrected; the earlier wording is kept below it.' : 'Response logged; the letter is marked acknowledged.' });
      onDone?.();
      return router.refresh();
    }
    for (const issue of result.issues) setError(issue.path as keyof LogResponseInput, { message: issue.message });
    setMessage({ ok: false, text: result.error });
  });

  const invalid = (name: keyof LogResponseInput) => (formState.errors[name] ? true : undefined);
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6">
      <h3 className="mb-2 font-semibold">{responseId ? 'Correct this response' : 'Log a response'}</h3>
      {message ? <p role={message.ok ? 'status' : 'alert'} className={`mb-3 text-sm ${message.ok ? 'text-verdict-pass' : 'text-verdict-fail'}`}><StatusIcon name={message.ok ? 'pass' : 'fail'} className="mr-1" />{message.text}</p> : null}
      <FormField id={`${prefix}-received`} label="Received on" error={formState.errors.receivedOn?.message}>
        <input id={`${prefix}-received`} type="date" className={inputClassName} aria-invalid={invalid('receivedOn')} {...register('receivedOn')} />
      </FormField>
      <FormField id={`${prefix}-type`} label="Kind of response" error={formState.errors.responseType?.message}>
        <select id={`${prefix}-type`} className={inputClassName} aria-invalid={invalid('responseType')} {...register('responseType')}>
          {Object.entries(RESPONSE_TYPES).map(([value, label]) => <option key={value} value={value}>{label}</option>)}
        </select>
      </FormField>
      <FormField id={`${prefix}-channel`} label="Received by" error={formState.errors.channel?.message}>
        <select id={`${prefix}-channel`} className={inputClassName} aria-invalid={invalid('channel')} {...register('channel')}>
          {Object.entries(RESPONSE_CHANNELS).map(([value, label]) => <option key={value} value={value}>{label}</option>)}
        </select>
      </FormField>
      <FormField id={`${prefix}-summary`} label="What the landowner said" hint="A summary; keep letters and e-mails in the file." error={formState.errors.summary?.message}>
        <textarea id={`${prefix}-summary`} rows={4} className={inputClassName} aria-describedby={`${prefix}-summary-hint`} aria-invalid={invalid('summary')} {...register('summary')} />
      </FormField>
      <button type="submit" className={buttonClassName} disabled={formState.isSubmitting}>{responseId ? 'Save the correction' : 'Log the response'}</button>
    </form>
  );
}
