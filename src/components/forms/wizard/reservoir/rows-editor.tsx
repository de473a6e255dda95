'use client';

import { type Control, type FieldValues, type Path, type UseFormRegister, useFieldArray, type ArrayPath, type FieldErrors } from 'react-hook-form';
import { inputClassName } from '@/components/ui/form-field';
import { asNumber, errorAt, numberInputProps } from '../../form-values';
import { describedBy } from '../../wizard-field';
import { CsvFill, type CsvRows, type CsvTable } from './csv-fill';
import { StatusIcon } from '@/components/ui/status-icon';

export interface RowColumn {
  key: string;
  label: string;
  /** The column's name inside a sentence: "The time must be …". */
  noun: string;
}

type Props<T extends FieldValues> = {
  idPrefix: string;
  caption: string;
  name: ArrayPath<T>;
  columns: readonly [RowColumn, RowColumn];
  control: Control<T>;
  register: UseFormRegister<T>;
  errors: FieldErrors<T>;
  /** `onFill` takes over when the file may change more than the rows (a storage file of volumes in an area table). */
  csv: { revisionId: string; table: CsvTable; hint: string; onFill?: (read: CsvRows) => boolean };
};

/** A table of typed number pairs (time and discharge, level and area …), rows added and removed, or filled from a CSV file. */
export function RowsEditor<T extends FieldValues>({ idPrefix, caption, name, columns, control, register, errors, csv }: Props<T>) {
  const rows = useFieldArray({ control, name });
  const listError = errorAt(errors, name) ?? errorAt(errors, `${name}.root`);
  const empty = Object.fromEntries(columns.map((c) => [c.key, undefined]));
  return (
    <div>
      {listError ? <p role="alert" className="mb-2 text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />The {caption.toLowerCase()} {listError}</p> : null}
      <table className="w-full max-w-xl border-collapse text-sm">
        <caption className="mb-1 text-left text-xs text-ink-faint">{caption}: {rows.fields.length} row{rows.fields.length === 1 ? '' : 's'}</caption>
        <thead>
          <tr className="border-b border-paper-edge text-left text-ink-soft">
            <th scope="col" className="py-1 pr-2">Row</th>
            {columns.map((c) => <th key={c.key} scope="col" className="py-1 pr-2">{c.label}</th>)}
            <th scope="col" className="py-1"><span className="sr-only">Remove</span></th>
          </tr>
        </thead>
        <tbody>
          {rows.fields.map((f, i) => (
            <tr key={f.id} className="align-top">
              <td className="num py-1 pr-2 text-ink-soft">{i + 1}</td>
              {columns.map((c) => {
                const id = `${idPrefix}-${i}-${c.key}`;
                const path = `${name}.${i}.${c.key}` as Path<T>;
                const error = errorAt(errors, path);
                return (
                  <td key={c.key} className="py-1 pr-2">
                    <label htmlFor={id} className="sr-only">{c.label}, row {i + 1}</label>
                    <input id={id} className={`${inputClassName} num py-1`} {...numberInputProps} {...describedBy(id, { error })} {...register(path, { setValueAs: asNumber })} />
                    {error ? <p id={`${id}-error`} role="alert" className="mt-1 text-xs text-verdict-fail">Row {i + 1}: the {c.noun} {error}</p> : null}
                  </td>
                );
              })}
              <td className="py-1"><button type="button" className="text-xs text-verdict-fail underline" onClick={() => rows.remove(i)}>Remove row {i + 1}</button></td>
            </tr>
          ))}
        </tbody>
      </table>
      <div className="mt-2 flex flex-wrap items-start gap-6 text-sm">
        <button type="button" className="text-accent underline" onClick={() => rows.append(empty as never)}>+ Add a row</button>
        <CsvFill idPrefix={idPrefix} revisionId={csv.revisionId} table={csv.table} hint={csv.hint} onRows={(read) => { if (!csv.onFill?.(read)) rows.replace(read.rows as never); }} />
      </div>
    </div>
  );
}
