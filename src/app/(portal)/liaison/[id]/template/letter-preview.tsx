'use client';

import { useState } from 'react';
import type { LetterPreview as Preview } from '@/lib/letters/preview-letter';
import { longDate } from '@/lib/dates/calendar-dates';
import type { SaveLetterTemplateInput } from '@/lib/validation/letter-schemas';
import { buttonClassName, inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { previewLetterAction } from './actions';
import { fieldWords } from './template-fields';

/** Shows, before any letter is made, what the template as typed says to one chosen parcel's owner. */
export function LetterPreview({ parcels, values }: { parcels: { reference: string; ownerName: string }[]; values: () => SaveLetterTemplateInput }) {
  const [parcelReference, setParcel] = useState(parcels[0]?.reference ?? '');
  const [preview, setPreview] = useState<Preview | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  if (parcels.length === 0) return <p className="mt-6 text-sm text-ink-soft">Upload the parcels register to preview a letter.</p>;

  const show = async () => {
    const result = await previewLetterAction({ ...values(), parcelReference });
    setPreview(result.ok ? result.data : null);
    setProblem(result.ok ? null : result.issues.length ? `${result.error} ${result.issues.map((i) => `${fieldWords(i.path)} ${i.message}`).join('; ')}` : result.error);
  };

  return (
    <section aria-labelledby="preview-heading" className="mt-8">
      <h3 id="preview-heading" className="font-semibold">Preview a letter</h3>
      <div className="mt-2 flex flex-wrap items-end gap-3">
        <label className="text-sm" htmlFor="preview-parcel">For parcel</label>
        <select id="preview-parcel" className={`${inputClassName} max-w-xs`} value={parcelReference} onChange={(e) => setParcel(e.target.value)}>
          {parcels.map((p) => <option key={p.reference} value={p.reference}>{p.reference}: {p.ownerName}</option>)}
        </select>
        <button type="button" className={buttonClassName} onClick={show}>Preview the letter</button>
      </div>
      {problem ? <p role="alert" className="mt-2 text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />{problem}</p> : null}
      {preview ? (
        <article aria-label={`Preview of the letter to ${preview.address[0]}`} className="mt-4 rounded border border-paper-edge bg-white p-5 text-sm leading-relaxed" data-testid="letter-preview">
          <p className="font-semibold">{preview.organisation}</p>
          <p className="text-ink-soft">Date: {longDate(preview.letterDate)} · Please respond by: {longDate(preview.respondBy)} · from revision <span className="num">{preview.revisionNumber}</span>{preview.preliminary ? ' (PRELIMINARY)' : ''}</p>
          {!preview.affected ? <p className="mt-2 text-verdict-caution">This parcel is not affected by the revision, so it would not get a letter; the preview shows the wording only.</p> : null}
          <address className="mt-3 not-italic">{preview.address.map((line) => <span key={line} className="block">{line}</span>)}</address>
          <p className="mt-3">Dear {preview.address[0]},</p>
          {[preview.paragraphs.introduction, preview.paragraphs.scheme].map((t) => <p key={t} className="mt-2 whitespace-pre-wrap">{t}</p>)}
          <p className="mt-3 font-semibold">What would change on your land</p>
          {preview.events.map((t) => <p key={t} className="mt-2">{t}</p>)}
          <p className="mt-3 italic text-ink-soft">The letter then prints the table, the diagram and the caution that these figures are estimates.</p>
          {[preview.paragraphs.response, preview.paragraphs.contact, 'Yours sincerely,', preview.paragraphs.signOff].map((t) => <p key={t} className="mt-2 whitespace-pre-wrap">{t}</p>)}
        </article>
      ) : null}
    </section>
  );
}
