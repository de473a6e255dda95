'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import type { CaseUnits } from '@/lib/validation/case-schema';
import { type ChannelStepInput, type ChannelStepValues, channelStepSchema } from '@/lib/validation/scheme-schemas';
import { CrossSectionChart } from '@/components/charts/cross-section-chart';
import { type PrismaticShape, drawingHeight, prismaticOutline } from '@/components/charts/section-outline';
import { inputClassName } from '@/components/ui/form-field';
import { asNumber, errorAt, numberInputProps } from '../form-values';
import { WizardField, describedBy } from '../wizard-field';
import { ManningNPicker } from './manning-n-picker';
import { StepActions } from './step-actions';
import { useStepSave } from './use-step-save';

const SHAPES = [
  { value: 'rectangular', label: 'Rectangular' },
  { value: 'trapezoidal', label: 'Trapezoidal' },
  { value: 'triangular', label: 'Triangular' },
  { value: 'circular', label: 'Circular (culvert or pipe)' },
] as const;

type Props = { schemeId: string; revisionId: string; units: CaseUnits; defaults?: Partial<ChannelStepInput>; bankHeight?: number; backHref: string };

export function PrismaticChannelForm({ schemeId, revisionId, units, defaults, bankHeight, backHref }: Props) {
  const length = units === 'US' ? 'ft' : 'm';
  const form = useForm<ChannelStepInput, unknown, ChannelStepValues>({
    resolver: zodResolver(channelStepSchema(units)),
    shouldUnregister: true,
    defaultValues: { section: { shape: 'trapezoidal' }, ...defaults } as ChannelStepInput,
  });
  const { register, handleSubmit, setError, setValue, control, formState } = form;
  const { save, failure } = useStepSave({ schemeId, revisionId, step: 'channel', setError });
  const section = (useWatch({ control, name: 'section' }) ?? { shape: 'trapezoidal' }) as PrismaticShape;
  const startUnequal = defaults?.section && 'sideSlopeLeft' in defaults.section && defaults.section.sideSlopeLeft !== undefined;
  const [unequal, setUnequal] = useState(Boolean(startUnequal));
  const e = (path: string) => errorAt(formState.errors, path);

  const bedSlope = useWatch({ control, name: 'bedSlope' });
  // A flat or adverse bed has no normal depth, so the level without the scheme cannot be found from the slope.
  const slopeCaution = typeof bedSlope === 'number' && Number.isFinite(bedSlope) && bedSlope <= 0
    ? `${bedSlope === 0 ? 'A horizontal' : 'An adverse'} bed has no normal depth: it is accepted only with the depth without the scheme, given on the Structure step.`
    : undefined;
  const numberField = (name: string, label: string, hint?: string, className = 'max-w-48') => {
    const id = `channel-${name.replace(/\./g, '-')}`;
    const caution = name === 'bedSlope' ? slopeCaution : undefined;
    return (
      <WizardField id={id} label={label} hint={hint} caution={caution} error={e(name)}>
        <input id={id} className={`${inputClassName} num ${className}`} {...numberInputProps} {...describedBy(id, { hint, caution, error: e(name) })} {...register(name as 'manningN', { setValueAs: asNumber })} />
      </WizardField>
    );
  };
  const slopeFields = unequal ? (
    <div className="grid gap-x-6 sm:grid-cols-2">
      {numberField('section.sideSlopeLeft', 'Left side slope (z horizontal : 1 vertical)')}
      {numberField('section.sideSlopeRight', 'Right side slope (z horizontal : 1 vertical)')}
    </div>
  ) : (
    numberField('section.sideSlope', 'Side slope (z horizontal : 1 vertical)', 'The same on both sides; 2 means 2 across for 1 up.')
  );
  const outline = prismaticOutline(section, drawingHeight(section, bankHeight));

  return (
    <form onSubmit={handleSubmit(async (values) => void (await save(values)))} noValidate>
      <div className="grid gap-8 lg:grid-cols-[3fr_2fr]">
        <div>
          <WizardField id="channel-shape" label="Cross-section shape" error={e('section.shape')}>
            <select id="channel-shape" className={`${inputClassName} max-w-72`} {...register('section.shape')}>
              {SHAPES.map((s) => <option key={s.value} value={s.value}>{s.label}</option>)}
            </select>
          </WizardField>
          {section.shape === 'rectangular' ? numberField('section.width', `Width (${length})`) : null}
          {section.shape === 'trapezoidal' ? numberField('section.bottomWidth', `Bottom width (${length})`) : null}
          {section.shape === 'circular' ? numberField('section.diameter', `Diameter (${length})`) : null}
          {section.shape === 'trapezoidal' || section.shape === 'triangular' ? (
            <>
              {slopeFields}
              <label className="mb-4 flex items-center gap-2 text-sm"><input type="checkbox" checked={unequal} onChange={(ev) => setUnequal(ev.target.checked)} /> The two sides have different slopes</label>
            </>
          ) : null}
          <div className="mb-4">
            {numberField('manningN', "Manning's n (dimensionless)", 'Roughness of the channel; typically 0.02 to 0.07 for natural channels.')}
            <ManningNPicker id="channel-manning-pick" onPick={(n) => setValue('manningN', n, { shouldValidate: true, shouldDirty: true })} />
          </div>
          {numberField('bedSlope', 'Bed slope (m/m)', 'Fall of the bed per unit length, positive when it falls downstream, e.g. 0.0006 for 0.6 m per km.')}
          {numberField('energyCoefficient', 'Energy coefficient, alpha (optional)', 'Velocity-head coefficient; leave blank for 1.')}
        </div>
        <div>
          <h2 className="mb-2 text-sm font-semibold">The section as entered</h2>
          {outline ? (
            <CrossSectionChart ground={outline.ground} cover={outline.cover} lengthUnit={length} yTitle={`Height above the bed (${length})`} caption={`${SHAPES.find((s) => s.value === section.shape)?.label ?? ''} section, drawn ${outline.height.toFixed(2)} ${length} high${bankHeight ? ' (to the bank top)' : ''}.`} />
          ) : (
            <p className="rounded border border-dashed border-paper-edge p-4 text-sm text-ink-soft">The drawing appears once the dimensions are entered.</p>
          )}
        </div>
      </div>
      <StepActions failure={failure} backHref={backHref} submitting={formState.isSubmitting} />
    </form>
  );
}
