'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { type Resolver, useForm, useWatch } from 'react-hook-form';
import type { CaseUnits } from '@/lib/validation/case-schema';
import { type StructureStepValues, structureStepSchema } from '@/lib/validation/scheme-schemas';
import { inputClassName } from '@/components/ui/form-field';
import { asNumber, errorAt, numberInputProps } from '../form-values';
import { WizardField, describedBy } from '../wizard-field';
import { HeadPreviewPanel } from './head-preview-panel';
import { fieldsStillBlank } from './preview-needs';
import { StepActions } from './step-actions';
import { type StructureForm, WEIR_KINDS, cleanStructure } from './structure-values';
import { useStepSave } from './use-step-save';

// Each type's coefficient with its equation form and unit, so that a Cd and a C are never typed into one label.
const COEFFICIENT_LABEL: Record<string, (u: string) => string> = {
  'sharp-crested': () => 'Cd (dimensionless)',
  'broad-crested': () => 'Cd (dimensionless)',
  ogee: (u) => `C (${u}^½/s)`,
};
const COEFFICIENT_FORM: Record<string, string> = {
  'sharp-crested': 'In Q = Cd·(2/3)·√(2g)·b·H^1.5, H the energy head.',
  'broad-crested': 'In Q = Cd·(2/3)·√((2/3)g)·b·H^1.5, H the energy head.',
  ogee: 'In Q = C·L·He^1.5, L the effective crest length.',
};

type Props = { schemeId: string; revisionId: string; units: CaseUnits; defaults?: StructureForm; backHref: string };

/** Step 4: the weir or spillway. The head over the crest and the control depth update as the designer types. */
export function StructureStepForm({ schemeId, revisionId, units, defaults, backHref }: Props) {
  const u = units === 'US' ? 'ft' : 'm';
  const schema = structureStepSchema(units);
  // The form keeps blanks and the hidden kinds' fields out (shouldUnregister); cleanStructure shapes the rest for the schema.
  const checkStructure = zodResolver(schema) as unknown as Resolver<StructureForm, unknown, StructureStepValues>;
  const resolver: Resolver<StructureForm, unknown, StructureStepValues> = (values, context, options) => checkStructure(cleanStructure(values) as unknown as StructureForm, context, options);
  const form = useForm<StructureForm, unknown, StructureStepValues>({ resolver, shouldUnregister: true, defaultValues: defaults ?? { control: { kind: 'broad-crested', approachVelocity: true, noseShape: 'square-edged' } } });
  const { register, handleSubmit, setError, control, formState } = form;
  const { save, failure } = useStepSave({ schemeId, revisionId, step: 'structure', setError });
  const [ownCoefficient, setOwnCoefficient] = useState(defaults?.control.coefficient !== undefined);
  const watched = useWatch({ control }) as StructureForm;
  const kind = watched.control?.kind ?? 'broad-crested';
  const e = (path: string) => errorAt(formState.errors, path);
  const cleaned = cleanStructure(watched);

  const numberField = (name: string, label: string, hint?: string) => {
    const id = `structure-${name.replace(/\./g, '-')}`;
    return (
      <WizardField id={id} label={label} hint={hint} error={e(name)}>
        <input id={id} className={`${inputClassName} num max-w-48`} {...numberInputProps} {...describedBy(id, { hint, error: e(name) })} {...register(name as 'control.kind', { setValueAs: asNumber })} />
      </WizardField>
    );
  };

  return (
    <form onSubmit={handleSubmit(async (values) => void (await save(values as unknown as StructureForm)))} noValidate>
      <div className="grid gap-8 lg:grid-cols-[3fr_2fr]">
        <div>
          <WizardField id="structure-kind" label="Type of structure" error={e('control.kind')}>
            <select id="structure-kind" className={`${inputClassName} max-w-80`} {...register('control.kind')}>
              {WEIR_KINDS.map((k) => <option key={k.value} value={k.value}>{k.label}</option>)}
            </select>
          </WizardField>
          <div className="grid gap-x-6 sm:grid-cols-2">
            {numberField('control.crestLength', `Crest length (${u})`, 'Across the flow, between the abutments.')}
            {numberField('control.sillHeight', `Sill height (${u})`, 'Crest above the channel bed at the structure.')}
            {kind === 'broad-crested' ? numberField('control.crestBreadth', `Crest breadth (${u})`, 'Along the flow.') : null}
            {kind === 'sharp-crested' ? numberField('control.channelWidth', `Approach channel width (${u}, optional)`, 'Giving it selects the Kindsvater–Carter method.') : null}
            {kind === 'ogee' ? numberField('control.designHead', `Design head (${u}, optional)`, 'Blank: the head at the largest flow.') : null}
          </div>
          {kind === 'broad-crested' ? (
            <WizardField id="structure-nose" label="Upstream edge of the crest" error={e('control.noseShape')}>
              <select id="structure-nose" className={`${inputClassName} max-w-60`} {...register('control.noseShape')}>
                <option value="square-edged">Square-edged</option>
                <option value="round-nosed">Round-nosed</option>
              </select>
            </WizardField>
          ) : null}
          <label className="mb-4 flex items-center gap-2 text-sm"><input type="checkbox" {...register('control.approachVelocity')} /> Allow for the approach velocity (adds its velocity head to the head over the crest)</label>
          <fieldset className="mb-4">
            <legend className="text-sm font-semibold">Discharge coefficient</legend>
            <div className="mt-1 flex flex-wrap gap-6 text-sm">
              <label className="flex items-center gap-2"><input type="radio" name="coefficient-choice" checked={!ownCoefficient} onChange={() => setOwnCoefficient(false)} /> The published default for this type (shown with its source on the right)</label>
              <label className="flex items-center gap-2"><input type="radio" name="coefficient-choice" checked={ownCoefficient} onChange={() => setOwnCoefficient(true)} /> My own value</label>
            </div>
          </fieldset>
          {ownCoefficient ? (
            <div className="grid gap-x-6 sm:grid-cols-[12rem_1fr]">
              {numberField('control.coefficient', COEFFICIENT_LABEL[kind]?.(u) ?? 'Coefficient', COEFFICIENT_FORM[kind])}
              <WizardField id="structure-reason" label="Reason for your own coefficient" noun="The reason" error={e('control.coefficientReason')}>
                <textarea id="structure-reason" rows={2} className={inputClassName} {...describedBy('structure-reason', { error: e('control.coefficientReason') })} {...register('control.coefficientReason')} />
              </WizardField>
            </div>
          ) : null}
          <div className="grid gap-x-6 sm:grid-cols-3">
            {numberField('control.piers.count', 'Number of piers', 'Blank for none.')}
            {numberField('control.piers.coefficient', 'Pier contraction coefficient', 'Blank for the default.')}
            {numberField('control.abutmentCoefficient', 'Abutment contraction coefficient', 'Blank for the default.')}
          </div>
          <div className="grid gap-x-6 sm:grid-cols-2">
            {numberField('control.tailwaterDepth', `Tailwater depth (${u}, optional)`, 'Depth of the water just downstream, above the bed. Left empty, the level the channel holds there without the scheme is used.')}
            {numberField('existingControl.depth', `Depth without the scheme (${u}, optional)`, 'At the structure today. Blank: normal depth. Needed on a flat or adverse bed.')}
          </div>
        </div>
        <div className="lg:sticky lg:top-4 lg:self-start">
          <HeadPreviewPanel revisionId={revisionId} structureJson={JSON.stringify(cleaned)} waitingFor={fieldsStillBlank(schema, cleaned)} lengthUnit={u} dischargeUnit={units === 'US' ? 'ft³/s' : 'm³/s'} />
        </div>
      </div>
      <StepActions failure={failure} backHref={backHref} submitting={formState.isSubmitting} />
    </form>
  );
}
