'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { type Resolver, useForm } from 'react-hook-form';
import type { ActionResult } from '@/lib/actions/action-result';
import { type SchemeStepInput, type SchemeStepValues, schemeStepSchema } from '@/lib/validation/scheme-schemas';
import { inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { asNumber, errorAt, numberInputProps } from '../form-values';
import { WizardField, describedBy } from '../wizard-field';
import { StepActions } from './step-actions';
import { type SaveFailure, useStepSave } from './use-step-save';

type CreateAction = (values: unknown) => Promise<ActionResult<{ schemeId: string }>>;

// The units chosen decide which schema (and so which unit words) the other fields are checked with.
const resolver: Resolver<SchemeStepInput, unknown, SchemeStepValues> = (values, context, options) => zodResolver(schemeStepSchema(values.units === 'US' ? 'US' : 'SI'))(values, context, options);

export function SchemeStepForm({ defaults, unitsLocked, target }: { defaults: Partial<SchemeStepInput>; unitsLocked: boolean; target: { create: CreateAction } | { schemeId: string; revisionId: string } }) {
  const router = useRouter();
  const form = useForm<SchemeStepInput, unknown, SchemeStepValues>({ resolver, defaultValues: { units: 'SI', ...defaults } });
  const { register, handleSubmit, setError, watch, formState } = form;
  const ids = 'schemeId' in target ? target : null;
  const editor = useStepSave({ schemeId: ids?.schemeId ?? '', revisionId: ids?.revisionId ?? '', step: 'scheme', setError });
  const edit = ids ? editor : null;
  const [createFailure, setCreateFailure] = useState<SaveFailure | null>(null);
  const length = watch('units') === 'US' ? 'ft' : 'm';
  const e = (path: string) => errorAt(formState.errors, path);

  const onSubmit = handleSubmit(async (values) => {
    if (edit) return void (await edit.save(values));
    if (!('create' in target)) return;
    const result = await target.create(values);
    if (result.ok) return router.push(`/schemes/${result.data.schemeId}/wizard/channel`);
    for (const issue of result.issues) setError(issue.path as keyof SchemeStepInput, { type: 'server', message: issue.message });
    setCreateFailure({ error: result.error, unplaced: result.issues.filter((i) => !(i.path in values)) });
  });

  const text = (name: 'name' | 'watercourse' | 'site' | 'datum', label: string, hint?: string) => (
    <WizardField id={`scheme-${name}`} label={label} hint={hint} error={e(name)}>
      <input id={`scheme-${name}`} className={inputClassName} {...describedBy(`scheme-${name}`, { hint, error: e(name) })} {...register(name)} />
    </WizardField>
  );
  // Blank is allowed (a surveyed reach supplies both), but never silently: once left, the field says what blank means.
  const blankCaution = (name: 'bedLevelAtControl' | 'reachLength', noun: string) =>
    (formState.touchedFields[name] || formState.isSubmitted) && watch(name) === undefined ? `${noun} is empty: a prismatic channel needs it (a surveyed reach takes it from the survey).` : undefined;
  const number = (name: 'bedLevelAtControl' | 'reachLength', label: string, noun: string, hint: string) => {
    const caution = blankCaution(name, noun);
    return (
      <WizardField id={`scheme-${name}`} label={`${label} (${length})`} noun={noun} hint={hint} caution={caution} error={e(name)}>
        <input id={`scheme-${name}`} className={`${inputClassName} num max-w-48`} {...numberInputProps} {...describedBy(`scheme-${name}`, { hint, caution, error: e(name) })} {...register(name, { setValueAs: asNumber })} />
      </WizardField>
    );
  };

  return (
    <form onSubmit={onSubmit} noValidate className="max-w-2xl">
      {text('name', 'Scheme name')}
      {text('watercourse', 'Watercourse', 'The river or stream, e.g. River Wendle.')}
      {text('site', 'Site', 'Where the structure is, e.g. Harrowfield Mill.')}
      <WizardField id="scheme-description" label="Site description" hint="Optional: what the scheme does and why." error={e('description')}>
        <textarea id="scheme-description" rows={3} className={inputClassName} {...register('description')} />
      </WizardField>
      {text('datum', 'Level datum', 'Every level is entered above this datum, e.g. Ordnance Datum Newlyn.')}
      <fieldset className="mb-4">
        <legend className="text-sm font-semibold">Units</legend>
        {unitsLocked ? (
          <p className="mt-1 text-sm">
            <input type="hidden" {...register('units')} />
            {defaults.units === 'US' ? 'US customary: feet and ft³/s' : 'SI: metres and m³/s'}
            <span className="block text-xs text-ink-faint">Fixed: the channel, flows or structure are already entered in these units.</span>
          </p>
        ) : (
          <div className="mt-1 flex flex-wrap gap-6 text-sm">
            <label className="flex items-center gap-2"><input type="radio" value="SI" {...register('units')} /> SI: metres and m³/s</label>
            <label className="flex items-center gap-2"><input type="radio" value="US" {...register('units')} /> US customary: feet and ft³/s</label>
          </div>
        )}
        {e('units') ? <p role="alert" className="mt-1 text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />Units {e('units')}</p> : null}
      </fieldset>
      <div className="grid gap-x-6 sm:grid-cols-2">
        {number('bedLevelAtControl', 'Bed level at the structure', 'The bed level at the structure', 'Above the datum. For a prismatic channel; a surveyed reach takes it from the survey.')}
        {number('reachLength', 'Reach length', 'The reach length', 'How far upstream to compute. For a prismatic channel; a surveyed reach ends at its last section.')}
      </div>
      <StepActions failure={edit ? edit.failure : createFailure} submitting={formState.isSubmitting} label={'create' in target ? 'Create the scheme and continue' : 'Save and continue'} />
    </form>
  );
}
