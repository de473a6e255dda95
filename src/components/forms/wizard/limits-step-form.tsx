'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import type { CaseUnits } from '@/lib/validation/case-schema';
import { type LimitsStepInput, type LimitsStepValues, limitsStepSchema } from '@/lib/validation/scheme-schemas';
import { inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { asNumber, errorAt, numberInputProps } from '../form-values';
import { WizardField, describedBy } from '../wizard-field';
import { LimitsOptions } from './limits-options';
import { StepActions } from './step-actions';
import { useStepSave } from './use-step-save';

export interface SurveyedSectionBank {
  distanceUpstream: number;
  /** The survey's own bank-top level: the lower ground level at the bank stations (or the section ends). */
  surveyedBankLevel: number;
}

type Props = { schemeId: string; revisionId: string; units: CaseUnits; sections: SurveyedSectionBank[] | null; defaults?: Partial<LimitsStepInput>; backHref: string };

const EMPTY_LIMIT = { label: '', distanceUpstream: undefined as unknown as number, maxLevel: undefined as unknown as number, freeboard: 0 };

/** Step 6: what counts as inundation and as an impact, the flood-level limits, and the optional sizing and sensitivity runs. */
export function LimitsStepForm({ schemeId, revisionId, units, sections, defaults, backHref }: Props) {
  const u = units === 'US' ? 'ft' : 'm';
  const form = useForm<LimitsStepInput, unknown, LimitsStepValues>({
    resolver: zodResolver(limitsStepSchema(units)),
    shouldUnregister: true,
    defaultValues: {
      impactThreshold: units === 'US' ? 0.033 : 0.01,
      limits: [],
      ...defaults,
      // Shown when the designer turns sizing or sensitivity on; left out of the values while they are off.
      sizing: defaults?.sizing ?? { vary: 'sillHeight', increment: units === 'US' ? 0.05 : 0.01 },
      sensitivity: defaults?.sensitivity ?? { manningN: 20, discharge: 20, coefficient: 10 },
    },
  });
  const { register, handleSubmit, setError, control, formState } = form;
  const limits = useFieldArray({ control, name: 'limits' });
  const { save, failure } = useStepSave({ schemeId, revisionId, step: 'limits', setError });
  const [sizing, setSizing] = useState(defaults?.sizing !== undefined);
  const [sensitivity, setSensitivity] = useState(defaults?.sensitivity !== undefined);
  const e = (path: string) => errorAt(formState.errors, path);
  const numberInput = (name: string, label: string, hint?: string, noun?: string) => {
    const id = `limits-${name.replace(/\./g, '-')}`;
    return (
      <WizardField id={id} label={label} hint={hint} noun={noun} error={e(name)}>
        <input id={id} className={`${inputClassName} num`} {...numberInputProps} {...describedBy(id, { hint, error: e(name) })} {...register(name as 'bankHeight', { setValueAs: asNumber })} />
      </WizardField>
    );
  };

  return (
    <form onSubmit={handleSubmit(async (values) => void (await save(values)))} noValidate>
      <h2 className="mb-2 text-lg font-semibold">Inundation threshold</h2>
      {sections === null ? (
        <div className="max-w-sm">{numberInput('bankHeight', `Bank-top height above the bed (${u})`, 'Water above it floods the banks. Blank: flooding is not checked.', 'The bank-top height')}</div>
      ) : (
        <table className="mb-4 w-full max-w-2xl border-collapse text-sm">
          <caption className="mb-1 text-left text-xs text-ink-faint">Leave a level blank to use the survey’s bank top (the lower ground level at its bank stations).</caption>
          <thead><tr className="border-b border-paper-edge text-left text-ink-soft"><th scope="col" className="py-1 pr-3">Section ({u} upstream)</th><th scope="col" className="py-1 pr-3">Survey bank top ({u})</th><th scope="col" className="py-1">Bank-top level to use ({u})</th></tr></thead>
          <tbody>
            {sections.map((s, i) => (
              <tr key={s.distanceUpstream} className="border-b border-paper-edge">
                <td className="num py-1 pr-3">{s.distanceUpstream}</td>
                <td className="num py-1 pr-3">{s.surveyedBankLevel.toFixed(2)}</td>
                <td className="py-1">
                  <label className="sr-only" htmlFor={`bank-${i}`}>Bank-top level at {s.distanceUpstream} {u}</label>
                  <input id={`bank-${i}`} className={`${inputClassName} num max-w-40`} {...numberInputProps} {...register(`sectionBankLevels.${i}`, { setValueAs: (v) => asNumber(v) ?? null })} />
                  {e(`sectionBankLevels.${i}`) ? <p role="alert" className="text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />The bank-top level {e(`sectionBankLevels.${i}`)}</p> : null}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <div className="grid max-w-2xl gap-x-6 sm:grid-cols-2">
        {numberInput('impactThreshold', `Impact threshold for afflux (${u})`, `The scheme's impact reaches as far as it raises the water by this much; ${units === 'US' ? '0.033 ft' : '0.010 m (10 mm)'} unless you change it.`, 'The impact threshold')}
        {numberInput('minimumMargin', `Minimum margin (${u}, optional)`, 'A pass with less room than this below any limit is reported as passing, but not robustly. Empty means 0.', 'The minimum margin')}
      </div>

      <h2 className="mb-2 mt-6 text-lg font-semibold">Flood-level limits</h2>
      <p className="mb-3 text-sm text-ink-soft">Each place the water must stay below: it passes when the water level plus the freeboard is at most the maximum level.</p>
      {limits.fields.map((f, i) => (
        <fieldset key={f.id} className="mb-4 rounded border border-paper-edge bg-white/60 p-4">
          <legend className="px-1 text-sm font-semibold">Limit {i + 1}</legend>
          <div className="grid gap-x-6 sm:grid-cols-2 lg:grid-cols-4">
            <WizardField id={`limit-${i}-label`} label="Place" noun="The place" error={e(`limits.${i}.label`)}>
              <input id={`limit-${i}-label`} className={inputClassName} {...register(`limits.${i}.label`)} />
            </WizardField>
            {numberInput(`limits.${i}.distanceUpstream`, `Distance upstream (${u})`)}
            {numberInput(`limits.${i}.maxLevel`, `Maximum level (${u})`, 'Above the datum.')}
            {numberInput(`limits.${i}.freeboard`, `Freeboard (${u})`)}
          </div>
          <button type="button" className="text-sm text-verdict-fail underline" onClick={() => limits.remove(i)}>Remove limit {i + 1}</button>
        </fieldset>
      ))}
      <button type="button" className="text-sm text-accent underline" onClick={() => limits.append(EMPTY_LIMIT)}>+ Add a limit</button>

      <LimitsOptions register={register} errorAt={e} units={units} sizing={sizing} setSizing={setSizing} sensitivity={sensitivity} setSensitivity={setSensitivity} />
      <StepActions failure={failure} backHref={backHref} submitting={formState.isSubmitting} label="Save and see the results" />
    </form>
  );
}
