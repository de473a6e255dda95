'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { type LetterParagraphs, MAX_RESPONSE_DAYS, MIN_RESPONSE_DAYS, type SaveLetterTemplateInput, saveLetterTemplateSchema } from '@/lib/validation/letter-schemas';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { saveLetterTemplateAction } from './actions';
import { LetterPreview } from './letter-preview';
import { FIELDS } from './template-fields';


export function TemplateForm({ schemeId, paragraphs, responseDays, version, readOnly, parcels }: { schemeId: string; paragraphs: LetterParagraphs; responseDays: number; version: number; readOnly: boolean; parcels: { reference: string; ownerName: string }[] }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, setError, getValues, formState } = useForm<SaveLetterTemplateInput>({ resolver: zodResolver(saveLetterTemplateSchema), defaultValues: { schemeId, responseDays, ...paragraphs } });

  const onSubmit = handleSubmit(async (values) => {
    const result = await saveLetterTemplateAction(values);
    if (result.ok) {
      setMessage({ ok: true, text: `Saved as template version ${result.data.version}. New letters will use it.` });
      return router.refresh();
    }
    for (const issue of result.issues) setError(issue.path as keyof SaveLetterTemplateInput, { message: issue.message });
    setMessage({ ok: false, text: result.error });
  });

  return (
    <form onSubmit={onSubmit} noValidate>
      <h2 className="mb-3 text-lg font-semibold">Letter paragraphs{version ? <span className="num ml-2 text-sm font-normal text-ink-soft">version {version}</span> : null}</h2>
      {message ? <p role={message.ok ? 'status' : 'alert'} className={`mb-3 text-sm ${message.ok ? 'text-verdict-pass' : 'text-verdict-fail'}`}><StatusIcon name={message.ok ? 'pass' : 'fail'} className="mr-1" />{message.text}</p> : null}
      {FIELDS.map((f) => (
        <FormField key={f.name} id={`template-${f.name}`} label={f.label} hint={f.hint} error={formState.errors[f.name]?.message}>
          <textarea id={`template-${f.name}`} rows={f.rows} readOnly={readOnly} aria-describedby={`template-${f.name}-hint${formState.errors[f.name] ? ` template-${f.name}-error` : ''}`} aria-invalid={formState.errors[f.name] ? true : undefined} className={inputClassName} {...register(f.name)} />
        </FormField>
      ))}
      <FormField id="template-response-days" label="Days to respond" hint={`Counted from the letter’s date; the letter gives the day itself ({response_deadline}). ${MIN_RESPONSE_DAYS} to ${MAX_RESPONSE_DAYS} days.`} error={formState.errors.responseDays?.message}>
        <input id="template-response-days" type="number" inputMode="numeric" min={MIN_RESPONSE_DAYS} max={MAX_RESPONSE_DAYS} step={1} readOnly={readOnly} aria-describedby="template-response-days-hint" aria-invalid={formState.errors.responseDays ? true : undefined} className={`${inputClassName} max-w-[8rem]`} {...register('responseDays', { valueAsNumber: true })} />
      </FormField>
      {readOnly ? <p className="text-sm text-ink-soft">Only a landowner liaison officer can change the template.</p> : <button type="submit" className={buttonClassName} disabled={formState.isSubmitting}>Save the template</button>}
      <LetterPreview parcels={parcels} values={getValues} />
    </form>
  );
}
