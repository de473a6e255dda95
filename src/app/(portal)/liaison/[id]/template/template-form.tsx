'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { type LetterParagraphs, type SaveLetterTemplateInput, saveLetterTemplateSchema } from '@/lib/validation/letter-schemas';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { saveLetterTemplateAction } from './actions';

const FIELDS: { name: keyof LetterParagraphs; label: string; hint: string; rows: number }[] = [
  { name: 'introduction', label: 'Who we are and why we write', hint: 'Opens the letter, after “Dear …”.', rows: 4 },
  { name: 'scheme', label: 'The scheme', hint: 'What the scheme is, in plain words.', rows: 4 },
  { name: 'response', label: 'How to respond', hint: 'After the figures and the caution.', rows: 4 },
  { name: 'contact', label: 'Contact details', hint: 'One item per line: office, address, telephone, e-mail.', rows: 4 },
  { name: 'signOff', label: 'Signed', hint: 'Name and position under “Yours sincerely”.', rows: 2 },
];

export function TemplateForm({ schemeId, paragraphs, version, readOnly }: { schemeId: string; paragraphs: LetterParagraphs; version: number; readOnly: boolean }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<SaveLetterTemplateInput>({ resolver: zodResolver(saveLetterTemplateSchema), defaultValues: { schemeId, ...paragraphs } });

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
      {readOnly ? <p className="text-sm text-ink-soft">Only a landowner liaison officer can change the template.</p> : <button type="submit" className={buttonClassName} disabled={formState.isSubmitting}>Save the template</button>}
    </form>
  );
}
