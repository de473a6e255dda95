'use client';

import type { UseFormReturn } from 'react-hook-form';
import type { ReservoirStepInput } from '@/lib/validation/reservoir-step-schema';
import { inputClassName } from '@/components/ui/form-field';
import { asNumber, errorAt, numberInputProps } from '../../form-values';
import { WizardField, describedBy } from '../../wizard-field';
import { RowsEditor } from './rows-editor';

type Form = UseFormReturn<ReservoirStepInput>;
type Choice = 'none' | 'table' | 'unit-shape';

const PEAK_HINT = 'From the start of the rise to the peak.';

/** One design event's inflow: none (its steady design discharge), a table of time and discharge, or a published shape. */
export function HydrographFields({ form, index, event, dischargeUnit, revisionId }: { form: Form; index: number; event: { name: string; discharge: number | null; climateChangeAllowance: number | null }; dischargeUnit: string; revisionId: string }) {
  const { register, control, formState, watch, setValue } = form;
  const name = `hydrographs.${index}` as const;
  const value = watch(name);
  const choice: Choice = value ? value.kind : 'none';
  const e = (path: string) => errorAt(formState.errors, path);
  const allowance = event.climateChangeAllowance ? ` plus its ${event.climateChangeAllowance} % climate-change allowance` : '';
  const choose = (next: Choice) => setValue(name, next === 'none' ? null : next === 'table' ? { kind: 'table', points: [] } : { kind: 'unit-shape', shape: 'nrcs-dimensionless', timeToPeak: undefined as unknown as number });
  const selectId = `inflow-${index}-kind`;
  const peakId = `inflow-${index}-time-to-peak`;
  const peakError = e(`${name}.timeToPeak`);
  return (
    <fieldset className="rounded border border-paper-edge bg-white/60 p-4">
      <legend className="px-1 text-sm font-semibold">Inflow for {event.name}</legend>
      <label htmlFor={selectId} className="block text-sm font-semibold">Inflow hydrograph</label>
      <select id={selectId} className={`${inputClassName} mt-1 max-w-xl`} value={choice} onChange={(ev) => choose(ev.target.value as Choice)}>
        <option value="none">None: check this event at its steady design discharge</option>
        <option value="table">A table of time and discharge</option>
        <option value="unit-shape">A shape from the design discharge and a time to peak</option>
      </select>
      {choice === 'table' ? (
        <div className="mt-4">
          {event.climateChangeAllowance ? <p className="mb-2 text-xs text-ink-faint">Enter the discharges before the allowance: each is raised by the event’s {event.climateChangeAllowance} % climate-change allowance.</p> : null}
          <RowsEditor<ReservoirStepInput>
            idPrefix={`inflow-${index}`}
            caption={`Inflow hydrograph of ${event.name}`}
            name={`${name}.points` as never}
            columns={[{ key: 'time', label: 'Time (hours from the start)', noun: 'time' }, { key: 'discharge', label: `Discharge (${dischargeUnit})`, noun: 'discharge' }]}
            control={control}
            register={register}
            errors={formState.errors}
            csv={{ revisionId, table: 'hydrograph', hint: `Two columns with a heading row: time in hours from the start (the first 0) and discharge in ${dischargeUnit}.` }}
          />
        </div>
      ) : null}
      {choice === 'unit-shape' ? (
        <div className="mt-4 max-w-sm">
          <p className="mb-2 text-xs text-ink-faint">The NRCS dimensionless unit hydrograph, scaled to peak at the design discharge{event.discharge !== null ? `: ${event.discharge} ${dischargeUnit}${allowance}` : ''}.</p>
          <WizardField id={peakId} label="Time to peak (hours)" hint={PEAK_HINT} error={peakError}>
            <input id={peakId} className={`${inputClassName} num`} {...numberInputProps} {...describedBy(peakId, { hint: PEAK_HINT, error: peakError })} {...register(`${name}.timeToPeak` as never, { setValueAs: asNumber })} />
          </WizardField>
        </div>
      ) : null}
    </fieldset>
  );
}
