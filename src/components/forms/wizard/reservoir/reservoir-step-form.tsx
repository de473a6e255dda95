'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { CaseUnits } from '@/lib/validation/case-schema';
import { type ReservoirStepInput, type ReservoirStepValues, reservoirStepSchema } from '@/lib/validation/reservoir-step-schema';
import { errorAt } from '../../form-values';
import { StepActions } from '../step-actions';
import { useStepSave } from '../use-step-save';
import { HydrographFields } from './hydrograph-fields';
import { StorageFields } from './storage-fields';
import { StatusIcon } from '@/components/ui/status-icon';

type Props = {
  schemeId: string;
  revisionId: string;
  units: CaseUnits;
  datum: string | null;
  events: { name: string; discharge: number | null; climateChangeAllowance: number | null }[];
  crestLevel: number | null;
  defaults: ReservoirStepInput;
  backHref: string;
};

/** The reservoir step: whether the floods are routed through storage, the storage, and each event's inflow. */
export function ReservoirStepForm({ schemeId, revisionId, units, datum, events, crestLevel, defaults, backHref }: Props) {
  const u = units === 'US' ? { length: 'ft', area: 'ft²', volume: 'ft³', discharge: 'ft³/s' } : { length: 'm', area: 'm²', volume: 'm³', discharge: 'm³/s' };
  const levelWords = `${u.length} above ${datum?.trim() ? datum.trim() : 'the datum'}`;
  const form = useForm<ReservoirStepInput, unknown, ReservoirStepValues>({ resolver: zodResolver(reservoirStepSchema(units)), defaultValues: defaults });
  const { handleSubmit, setError, formState, setValue } = form;
  const [routed, setRouted] = useState(defaults.reservoir !== undefined);
  const { save, failure } = useStepSave({ schemeId, revisionId, step: 'reservoir', setError });
  const e = (path: string) => errorAt(formState.errors, path);
  const route = (on: boolean) => {
    setRouted(on);
    // Hidden parts are set, not unregistered: each choice replaces its whole part, so nothing stale is sent.
    setValue('reservoir', on ? { storage: { kind: 'level-area', rows: [] } } : undefined);
    if (!on) events.forEach((_, i) => setValue(`hydrographs.${i}`, null));
  };
  const submit = async (values: ReservoirStepValues) => void (await save(values));
  return (
    <form onSubmit={handleSubmit(submit)} noValidate>
      <p className="mb-4 max-w-3xl text-sm text-ink-soft">Where the structure holds back a reservoir, a flood is stored as it rises and leaves over the crest lower and later. Give the storage and, for each event to be routed, its inflow hydrograph. Events without one are checked at their steady design discharge.</p>
      <label className="mb-6 flex items-center gap-2 text-sm font-semibold">
        <input type="checkbox" checked={routed} onChange={(ev) => route(ev.target.checked)} />
        Route the design floods through a reservoir behind the structure
      </label>
      {routed ? (
        <div className="space-y-6">
          {e('reservoir') ? <p role="alert" className="text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />The reservoir {e('reservoir')}</p> : null}
          <StorageFields form={form} units={u} revisionId={revisionId} crestLevel={crestLevel} levelWords={levelWords} />
          {e('hydrographs') ? <p role="alert" className="text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />The inflow hydrographs {e('hydrographs')}</p> : null}
          {events.map((event, i) => <HydrographFields key={i} form={form} index={i} event={event} dischargeUnit={u.discharge} revisionId={revisionId} />)}
        </div>
      ) : null}
      <StepActions failure={failure} backHref={backHref} submitting={formState.isSubmitting} />
    </form>
  );
}
