'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useFieldArray, useForm } from 'react-hook-form';
import type { CaseUnits } from '@/lib/validation/case-schema';
import { type FlowsStepInput, type FlowsStepValues, flowsStepSchema } from '@/lib/validation/scheme-schemas';
import { inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { asNumber, errorAt, numberInputProps } from '../form-values';
import { WizardField, describedBy } from '../wizard-field';
import { StepActions } from './step-actions';
import { useStepSave } from './use-step-save';

type Props = { schemeId: string; revisionId: string; units: CaseUnits; defaults?: Partial<FlowsStepInput>; backHref: string };

const EMPTY_EVENT = { name: '', discharge: undefined as unknown as number };

/** Step 3: the design flows, each with its probability and climate-change allowance, and which one governs. */
export function FlowsStepForm({ schemeId, revisionId, units, defaults, backHref }: Props) {
  const discharge = units === 'US' ? 'ft³/s' : 'm³/s';
  const form = useForm<FlowsStepInput, unknown, FlowsStepValues>({
    resolver: zodResolver(flowsStepSchema(units)),
    defaultValues: { events: [EMPTY_EVENT], governing: 'all', ...defaults },
  });
  const { register, handleSubmit, setError, control, formState } = form;
  const events = useFieldArray({ control, name: 'events' });
  const { save, failure } = useStepSave({ schemeId, revisionId, step: 'flows', setError });
  const e = (path: string) => errorAt(formState.errors, path);

  const cell = (i: number, name: 'discharge' | 'annualExceedanceProbability' | 'returnPeriod' | 'climateChangeAllowance', label: string, hint?: string) => {
    const id = `event-${i}-${name}`;
    const error = e(`events.${i}.${name}`);
    return (
      <WizardField id={id} label={label} hint={hint} error={error}>
        <input id={id} className={`${inputClassName} num`} {...numberInputProps} {...describedBy(id, { hint, error })} {...register(`events.${i}.${name}`, { setValueAs: asNumber })} />
      </WizardField>
    );
  };

  return (
    <form onSubmit={handleSubmit(async (values) => void (await save(values)))} noValidate>
      {e('events') ? <p role="alert" className="mb-3 text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />The list of events {e('events')}</p> : null}
      <Controller
        control={control}
        name="governing"
        render={({ field }) => (
          <div className="space-y-6">
            {events.fields.map((f, i) => (
              <fieldset key={f.id} className="rounded border border-paper-edge bg-white/60 p-4">
                <legend className="px-1 text-sm font-semibold">Event {i + 1}</legend>
                <div className="grid gap-x-6 sm:grid-cols-2 lg:grid-cols-3">
                  <WizardField id={`event-${i}-name`} label="Name" noun="The name" hint="e.g. 1% AEP, or 100-year flood" error={e(`events.${i}.name`)}>
                    <input id={`event-${i}-name`} className={inputClassName} {...register(`events.${i}.name`)} />
                  </WizardField>
                  {cell(i, 'discharge', `Discharge (${discharge})`, 'Before the climate-change allowance.')}
                  {cell(i, 'climateChangeAllowance', 'Climate-change allowance (%)', 'Added to the discharge; blank for none.')}
                  {cell(i, 'annualExceedanceProbability', 'Annual exceedance probability (fraction)', '0.01 means 1 % a year; give this or the return period.')}
                  {cell(i, 'returnPeriod', 'Return period (years)', 'Optional, e.g. 100.')}
                </div>
                <div className="flex flex-wrap items-center justify-between gap-3 text-sm">
                  <label className="flex items-center gap-2"><input type="radio" name="governing-choice" checked={field.value === i} onChange={() => field.onChange(i)} /> This is the governing event</label>
                  {events.fields.length > 1 ? (
                    <button type="button" className="text-verdict-fail underline" onClick={() => { if (field.value === i) field.onChange('all'); else if (typeof field.value === 'number' && field.value > i) field.onChange(field.value - 1); events.remove(i); }}>Remove event {i + 1}</button>
                  ) : null}
                </div>
              </fieldset>
            ))}
            <label className="flex items-center gap-2 text-sm"><input type="radio" name="governing-choice" checked={field.value === 'all'} onChange={() => field.onChange('all')} /> No single governing event: check every event alike</label>
            {e('governing') ? <p role="alert" className="text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />The governing event {e('governing')}</p> : null}
          </div>
        )}
      />
      <button type="button" className="mt-4 text-sm text-accent underline" onClick={() => events.append(EMPTY_EVENT)}>+ Add another event</button>
      <p className="mt-4 text-xs text-ink-faint">Every event is checked against every limit; the governing one is shown first on the results sheet.</p>
      <StepActions failure={failure} backHref={backHref} submitting={formState.isSubmitting} />
    </form>
  );
}
