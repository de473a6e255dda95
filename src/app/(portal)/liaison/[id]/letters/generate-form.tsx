'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { revisionStanding } from '@/lib/certificates/revision-standing';
import { type GenerateLettersInput, generateLettersSchema } from '@/lib/validation/letter-schemas';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { generateLettersAction } from './actions';
import { ParcelChooser } from './parcel-chooser';

type RevisionOption = { id: string; number: number; status: string; revoked: boolean };

/** Makes one letter per affected parcel from the chosen revision; a revision not countersigned gives PRELIMINARY letters. */
export function GenerateForm({ schemeId, revisions }: { schemeId: string; revisions: RevisionOption[] }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const preferred = revisions.find((r) => r.status === 'countersigned' && !r.revoked) ?? revisions.find((r) => !r.revoked) ?? revisions[0];
  const { register, handleSubmit, watch, setValue, setError, formState } = useForm<GenerateLettersInput>({ resolver: zodResolver(generateLettersSchema), defaultValues: { schemeId, revisionId: preferred?.id ?? '' } });
  const revisionId = watch('revisionId');
  const chosen = revisions.find((r) => r.id === revisionId);
  const parcelReferences = watch('parcelReferences');
  const { onChange: onRevisionChange, ...revisionField } = register('revisionId');

  const onSubmit = handleSubmit(async (values) => {
    const result = await generateLettersAction(values);
    if (result.ok) {
      const { letters, toPost } = result.data;
      const post = toPost > 0 ? ` ${toPost} of them ${toPost === 1 ? 'is' : 'are'} to post (no e-mail address).` : '';
      setMessage({ ok: true, text: `${letters} letter${letters === 1 ? '' : 's'} made${result.data.preliminary ? ' (PRELIMINARY)' : ''}, queued for sending below.${post}` });
      return router.refresh();
    }
    for (const issue of result.issues) setError(issue.path as keyof GenerateLettersInput, { message: issue.message });
    setMessage({ ok: false, text: result.error });
  });

  if (revisions.length === 0) return <p className="text-sm text-ink-soft">The scheme has no revision yet, so there is nothing to write about.</p>;
  return (
    <form onSubmit={onSubmit} noValidate className="max-w-xl">
      <h2 className="mb-3 text-lg font-semibold">Make letters</h2>
      {message ? <p role={message.ok ? 'status' : 'alert'} className={`mb-3 text-sm ${message.ok ? 'text-verdict-pass' : 'text-verdict-fail'}`}><StatusIcon name={message.ok ? 'pass' : 'fail'} className="mr-1" />{message.text}</p> : null}
      <FormField id="letters-revision" label="From revision" hint="One letter for each parcel the impact table shows as affected, from the current parcels register and letter template." error={formState.errors.revisionId?.message}>
        <select id="letters-revision" className={inputClassName} aria-describedby="letters-revision-hint" {...revisionField} onChange={(e) => { setValue('parcelReferences', undefined); return onRevisionChange(e); }}>
          {revisions.map((r) => <option key={r.id} value={r.id}>Revision {r.number} ({revisionStanding(r)})</option>)}
        </select>
      </FormField>
      {chosen?.revoked ? <p role="note" className="mb-4 border-l-4 border-verdict-fail bg-paper-deep px-3 py-2 text-sm"><StatusIcon name="fail" className="mr-1" />The certificate of revision {chosen.number} was revoked: letters cannot be made from it.</p> : null}
      {chosen && !chosen.revoked && chosen.status !== 'countersigned' ? <p role="note" className="mb-4 border-l-4 border-verdict-caution bg-paper-deep px-3 py-2 text-sm"><StatusIcon name="caution" className="mr-1" />Revision {chosen.number} is not countersigned: its letters will be watermarked PRELIMINARY.</p> : null}
      {chosen && !chosen.revoked ? <ParcelChooser schemeId={schemeId} revisionId={chosen.id} chosen={parcelReferences} onChange={(refs) => setValue('parcelReferences', refs)} /> : null}
      {formState.errors.parcelReferences ? <p role="alert" className="mb-3 text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />Parcels to write to: {formState.errors.parcelReferences.message}</p> : null}
      <button type="submit" className={buttonClassName} disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Making letters…' : 'Make letters'}</button>
    </form>
  );
}
