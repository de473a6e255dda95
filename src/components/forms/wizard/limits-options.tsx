'use client';

import type { UseFormRegister } from 'react-hook-form';
import type { CaseUnits } from '@/lib/validation/case-schema';
import type { LimitsStepInput } from '@/lib/validation/scheme-schemas';
import { inputClassName } from '@/components/ui/form-field';
import { asNumber, numberInputProps } from '../form-values';
import { WizardField, describedBy } from '../wizard-field';

type Props = {
  register: UseFormRegister<LimitsStepInput>;
  errorAt: (path: string) => string | undefined;
  units: CaseUnits;
  sizing: boolean;
  setSizing: (on: boolean) => void;
  sensitivity: boolean;
  setSensitivity: (on: boolean) => void;
};

/** Crest sizing and the sensitivity table: both re-run the engine, so they are asked for, not always on. */
export function LimitsOptions({ register, errorAt, units, sizing, setSizing, sensitivity, setSensitivity }: Props) {
  const u = units === 'US' ? 'ft' : 'm';
  const numberInput = (name: string, label: string, hint?: string) => {
    const id = `limits-${name.replace(/\./g, '-')}`;
    const error = errorAt(name);
    return (
      <WizardField id={id} label={label} hint={hint} error={error}>
        <input id={id} className={`${inputClassName} num`} {...numberInputProps} {...describedBy(id, { hint, error })} {...register(name as 'impactThreshold', { setValueAs: asNumber })} />
      </WizardField>
    );
  };
  return (
    <>
      <h2 className="mb-2 mt-6 text-lg font-semibold">Crest sizing</h2>
      <label className="mb-3 flex items-center gap-2 text-sm"><input type="checkbox" checked={sizing} onChange={(e) => setSizing(e.target.checked)} /> Size the crest so that every limit passes in every event</label>
      {sizing ? (
        <div className="grid gap-x-6 sm:grid-cols-2 lg:grid-cols-4">
          <WizardField id="limits-sizing-vary" label="Size by" noun="What to size" error={errorAt('sizing.vary')}>
            <select id="limits-sizing-vary" className={inputClassName} {...register('sizing.vary')}>
              <option value="sillHeight">The highest sill that passes</option>
              <option value="crestLength">The shortest crest that passes</option>
            </select>
          </WizardField>
          {numberInput('sizing.increment', `Step (${u})`, 'The answer is a multiple of this.')}
          {numberInput('sizing.min', `Search from (${u}, optional)`)}
          {numberInput('sizing.max', `Search to (${u}, optional)`, 'Empty: up to the bank, the limits or the channel width.')}
          <label className="flex items-center gap-2 text-sm sm:col-span-2 lg:col-span-4"><input type="checkbox" {...register('sizing.robust')} /> Size so that every sensitivity run passes too (slower)</label>
        </div>
      ) : null}
      <h2 className="mb-2 mt-6 text-lg font-semibold">Sensitivity</h2>
      <label className="mb-3 flex items-center gap-2 text-sm"><input type="checkbox" checked={sensitivity} onChange={(e) => setSensitivity(e.target.checked)} /> Show how the levels at the limits change with Manning’s n, the discharge and the coefficient</label>
      {sensitivity ? (
        <div className="grid gap-x-6 sm:grid-cols-3">
          {numberInput('sensitivity.manningN', "Manning's n up and down by (%)")}
          {numberInput('sensitivity.discharge', 'Discharge up by (%)')}
          {numberInput('sensitivity.coefficient', 'Coefficient up and down by (%)')}
        </div>
      ) : null}
    </>
  );
}
