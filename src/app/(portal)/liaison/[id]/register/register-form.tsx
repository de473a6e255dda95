'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { type FieldPath, useFieldArray, useForm } from 'react-hook-form';
import { BANK_SIDES, type ParcelInput, type SaveParcelsInput, saveParcelsSchema } from '@/lib/validation/parcel-schemas';
import { buttonClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { saveParcelEditsAction } from './actions';
import { ScrollRegion } from '@/components/ui/scroll-region';

const cell = 'w-full min-w-0 rounded border border-paper-edge bg-white px-2 py-1 text-sm aria-[invalid=true]:border-verdict-fail';
const numberOrNull = (v: unknown) => (v === '' || v === null || v === undefined ? null : Number(v));
const EMPTY: ParcelInput = { reference: '', ownerName: '', postalAddress: '', email: '', distanceFromM: 0, distanceToM: 0, bankSide: 'left', groundLevelM: null, landUse: '' };

/** The register as an editable table; saving makes a new register version and keeps the old one. */
export function RegisterForm({ schemeId, baseRegisterId, parcels }: { schemeId: string; baseRegisterId: string; parcels: ParcelInput[] }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const form = useForm<SaveParcelsInput>({ resolver: zodResolver(saveParcelsSchema), defaultValues: { schemeId, baseRegisterId, note: '', parcels } });
  const { fields, append, remove } = useFieldArray({ control: form.control, name: 'parcels' });
  const errors = form.formState.errors;

  const onSubmit = form.handleSubmit(async (values) => {
    const result = await saveParcelEditsAction(values);
    if (result.ok) {
      setMessage({ ok: true, text: `Saved as version ${result.data.version}: ${result.data.added.length} added, ${result.data.removed.length} removed, ${result.data.changed.length} changed.` });
      return router.refresh();
    }
    for (const issue of result.issues) form.setError(issue.path.replace(/\[(\d+)\]/g, '.$1') as FieldPath<SaveParcelsInput>, { message: issue.message });
    setMessage({ ok: false, text: result.error });
  });

  const field = (i: number, name: keyof ParcelInput, label: string, options: { type?: string; number?: 'required' | 'optional'; className?: string } = {}) => {
    const error = errors.parcels?.[i]?.[name]?.message;
    const id = `parcel-${i}-${name}`;
    const setValueAs = options.number === 'optional' ? numberOrNull : options.number === 'required' ? (v: unknown) => (v === '' ? undefined : Number(v)) : undefined;
    return (
      <td className={`py-1 pr-2 align-top ${options.className ?? ''}`}>
        <input id={id} aria-label={`${label}, row ${i + 1}`} aria-invalid={error ? true : undefined} aria-describedby={error ? `${id}-error` : undefined} type={options.type ?? 'text'} step={options.number ? 'any' : undefined} className={cell} {...form.register(`parcels.${i}.${name}`, setValueAs ? { setValueAs } : {})} />
        {error ? <p id={`${id}-error`} className="mt-0.5 text-xs text-verdict-fail"><StatusIcon name="fail" className="mr-1" />{error}</p> : null}
      </td>
    );
  };

  return (
    <form onSubmit={onSubmit} noValidate>
      {message ? <p role={message.ok ? 'status' : 'alert'} className={`mb-3 text-sm ${message.ok ? 'text-verdict-pass' : 'text-verdict-fail'}`}><StatusIcon name={message.ok ? 'pass' : 'fail'} className="mr-1" />{message.text}</p> : null}
      {errors.parcels?.message || errors.parcels?.root?.message ? <p role="alert" className="mb-3 text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />Parcels: {errors.parcels?.message ?? errors.parcels?.root?.message}</p> : null}
      <ScrollRegion label="Parcels register, editable">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Parcels register, editable</caption>
          <thead>
            <tr className="border-b border-paper-edge text-left text-ink-soft">
              {['Parcel', 'Owner or occupier', 'Postal address', 'E-mail', 'From (m)', 'To (m)', 'Bank', 'Ground level (m)', 'Land use', ''].map((h) => <th key={h} scope="col" className="py-2 pr-2 font-normal">{h}</th>)}
            </tr>
          </thead>
          <tbody>
            {fields.map((f, i) => (
              <tr key={f.id} className="border-b border-paper-edge">
                {field(i, 'reference', 'Parcel reference', { className: 'min-w-[6rem]' })}
                {field(i, 'ownerName', 'Owner or occupier', { className: 'min-w-[11rem]' })}
                {field(i, 'postalAddress', 'Postal address', { className: 'min-w-[14rem]' })}
                {field(i, 'email', 'E-mail', { type: 'email', className: 'min-w-[14rem]' })}
                {field(i, 'distanceFromM', 'From, metres upstream', { type: 'number', number: 'required', className: 'min-w-[6rem]' })}
                {field(i, 'distanceToM', 'To, metres upstream', { type: 'number', number: 'required', className: 'min-w-[6rem]' })}
                <td className="min-w-[6.5rem] py-1 pr-2 align-top">
                  <select aria-label={`Bank, row ${i + 1}`} className={cell} {...form.register(`parcels.${i}.bankSide`)}>
                    {BANK_SIDES.map((b) => <option key={b} value={b}>{b}</option>)}
                  </select>
                </td>
                {field(i, 'groundLevelM', 'Ground level, metres', { type: 'number', number: 'optional', className: 'min-w-[6.5rem]' })}
                {field(i, 'landUse', 'Land use', { className: 'min-w-[10rem]' })}
                <td className="py-1 align-top"><button type="button" className="text-sm text-ink-soft underline hover:text-verdict-fail" onClick={() => remove(i)}>Remove<span className="sr-only"> row {i + 1}</span></button></td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>
      <div className="mt-4 flex flex-wrap items-end gap-4">
        <button type="button" className="rounded border border-accent px-3 py-2 text-sm font-semibold text-accent" onClick={() => append(EMPTY)}>Add a parcel</button>
        <div className="grow">
          <label htmlFor="register-note" className="block text-sm font-semibold">What changed (kept in the history)</label>
          <input id="register-note" className={cell} {...form.register('note')} placeholder="e.g. New owner at HM-04" />
        </div>
        <button type="submit" className={buttonClassName} disabled={form.formState.isSubmitting}>Save as a new version</button>
      </div>
    </form>
  );
}
