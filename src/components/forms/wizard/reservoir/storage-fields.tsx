'use client';

import type { UseFormReturn } from 'react-hook-form';
import type { ReservoirStepInput } from '@/lib/validation/reservoir-step-schema';
import { inputClassName } from '@/components/ui/form-field';
import { asNumber, errorAt, numberInputProps } from '../../form-values';
import { WizardField, describedBy } from '../../wizard-field';
import type { CsvRows } from './csv-fill';
import { RowsEditor } from './rows-editor';

type Form = UseFormReturn<ReservoirStepInput>;
type Units = { length: string; area: string; volume: string };

const KINDS = [
  { kind: 'level-area', label: 'A table of surface area by level' },
  { kind: 'level-volume', label: 'A table of stored volume by level' },
  { kind: 'constant-area', label: 'One surface area at every level (steep-sided, or a first estimate)' },
] as const;

/** The reservoir's storage, its level at the start of the flood and its length along the valley. */
export function StorageFields({ form, units, revisionId, crestLevel, levelWords }: { form: Form; units: Units; revisionId: string; crestLevel: number | null; levelWords: string }) {
  const { register, control, formState, watch, setValue } = form;
  // Watched as a whole: the choices below replace the whole storage, and RHF tells a watcher of the path it sets.
  const kind = watch('reservoir.storage')?.kind;
  const e = (path: string) => errorAt(formState.errors, path);
  // A file of volumes read into the area table (or the other way) switches the table to what the file gives.
  const switchKind = (read: CsvRows): boolean => {
    if (!read.kind || read.kind === kind) return false;
    setValue('reservoir.storage', { kind: read.kind, rows: read.rows } as NonNullable<ReservoirStepInput['reservoir']>['storage']);
    return true;
  };
  const number = (name: 'reservoir.startLevel' | 'reservoir.length' | 'reservoir.storage.area', label: string, hint: string, noun: string) => {
    const id = name.replace(/\./g, '-');
    return (
      <WizardField id={id} label={label} hint={hint} noun={noun} error={e(name)}>
        <input id={id} className={`${inputClassName} num`} {...numberInputProps} {...describedBy(id, { hint, error: e(name) })} {...register(name, { setValueAs: asNumber })} />
      </WizardField>
    );
  };
  return (
    <fieldset className="rounded border border-paper-edge bg-white/60 p-4">
      <legend className="px-1 text-sm font-semibold">Storage</legend>
      <div role="radiogroup" aria-label="How the storage is given" className="mb-4 space-y-1 text-sm">
        {KINDS.map((k) => (
          <label key={k.kind} className="flex items-center gap-2">
            <input type="radio" name="storage-kind" checked={kind === k.kind} onChange={() => setValue('reservoir.storage', k.kind === 'constant-area' ? { kind: k.kind, area: undefined as unknown as number } : { kind: k.kind, rows: [] }, { shouldValidate: false })} />
            {k.label}
          </label>
        ))}
      </div>
      {kind === 'level-area' || kind === 'level-volume' ? (
        <RowsEditor<ReservoirStepInput>
          key={kind}
          idPrefix={`storage-${kind}`}
          caption={kind === 'level-area' ? 'Surface area by level' : 'Stored volume by level'}
          name="reservoir.storage.rows"
          columns={[{ key: 'level', label: `Level (${levelWords})`, noun: 'level' }, kind === 'level-area' ? { key: 'area', label: `Surface area (${units.area})`, noun: 'surface area' } : { key: 'volume', label: `Volume stored (${units.volume})`, noun: 'volume' }]}
          control={control}
          register={register}
          errors={formState.errors}
          csv={{ revisionId, table: 'storage', hint: `Two columns with a heading row: level (${levelWords}) and either area (${units.area}) or volume (${units.volume}), lowest level first.`, onFill: (read) => switchKind(read) }}
        />
      ) : null}
      {kind === 'constant-area' ? <div className="max-w-sm">{number('reservoir.storage.area', `Surface area (${units.area})`, 'The water surface, taken as the same at every level.', 'The surface area')}</div> : null}
      <div className="mt-4 grid gap-x-6 sm:grid-cols-2">
        {number('reservoir.startLevel', `Level at the start of the flood (${levelWords})`, crestLevel !== null ? `Blank: the crest level, ${crestLevel.toFixed(3)} ${levelWords}.` : 'Blank: the crest level.', 'The level at the start of the flood')}
        {number('reservoir.length', `Length of the reservoir along the valley (${units.length})`, 'Optional. Limits within this distance of the structure are checked against the peak reservoir level.', 'The length of the reservoir')}
      </div>
    </fieldset>
  );
}
