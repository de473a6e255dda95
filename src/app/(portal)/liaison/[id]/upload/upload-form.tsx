'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import type { CsvIssue } from '@/lib/parcels/parcel-columns';
import type { ParcelsCsvPreview } from '@/lib/parcels/preview-parcels-csv';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { PreviewTable } from './preview-table';

type State = { kind: 'idle' } | { kind: 'checking' } | { kind: 'previewed'; preview: ParcelsCsvPreview } | { kind: 'refused'; message: string } | { kind: 'stored'; version: number; parcels: number };

async function post(url: string, file: File): Promise<Response> {
  return fetch(url, { method: 'POST', body: file, headers: { 'content-type': 'text/csv', 'x-file-name': encodeURIComponent(file.name) } });
}

/** Choose a file, see every row checked with line-numbered problems, then store it as the next register version. */
export function UploadForm({ schemeId, limitBytes }: { schemeId: string; limitBytes: number }) {
  const router = useRouter();
  const [file, setFile] = useState<File | null>(null);
  const [state, setState] = useState<State>({ kind: 'idle' });
  const [fileError, setFileError] = useState<string | undefined>();

  const choose = async (chosen: File | null) => {
    setFile(chosen);
    setFileError(undefined);
    if (!chosen) return setState({ kind: 'idle' });
    if (chosen.size > limitBytes) return setFileError(`The file is ${Math.ceil(chosen.size / 1024)} KB; a parcels CSV may be at most ${Math.round(limitBytes / 1024)} KB.`);
    setState({ kind: 'checking' });
    const response = await post(`/api/parcels/${schemeId}/csv-preview`, chosen);
    const body = await response.json();
    if (!response.ok) return setState({ kind: 'refused', message: body.issues?.[0]?.message ?? body.error });
    setState({ kind: 'previewed', preview: body as ParcelsCsvPreview });
  };

  const store = async () => {
    if (!file) return;
    const response = await post(`/api/parcels/${schemeId}/csv`, file);
    const body = await response.json();
    if (!response.ok) return setState({ kind: 'refused', message: body.error });
    setState({ kind: 'stored', version: body.version, parcels: body.parcels });
    router.refresh();
  };

  const issues: CsvIssue[] = state.kind === 'previewed' ? state.preview.issues : [];
  return (
    <div>
      <FormField id="parcels-file" label="Parcels CSV file" hint="Nothing is stored until you choose “Store as the register”." error={fileError ?? (state.kind === 'refused' ? state.message : undefined)}>
        <input id="parcels-file" type="file" accept=".csv,text/csv" className={inputClassName} aria-describedby="parcels-file-hint" onChange={(e) => choose(e.target.files?.[0] ?? null)} />
      </FormField>
      {state.kind === 'checking' ? <p role="status" className="text-sm">Checking the file…</p> : null}
      {state.kind === 'stored' ? (
        <p role="status" className="rounded border border-verdict-pass px-4 py-3 text-sm">
          <StatusIcon name="pass" className="mr-1" />Stored as register version <span className="num">{state.version}</span> with <span className="num">{state.parcels}</span> parcels.{' '}
          <Link className="text-accent underline" href={`/liaison/${schemeId}/impact`}>See the impact on each parcel</Link>
        </p>
      ) : null}
      {state.kind === 'previewed' ? (
        <>
          {state.preview.ok ? (
            <p role="status" className="mb-3 text-sm"><StatusIcon name="pass" className="mr-1" />All <span className="num">{state.preview.rowCount}</span> parcels are valid.</p>
          ) : (
            <div role="alert" className="mb-3 border-l-4 border-verdict-fail bg-paper-deep px-4 py-3 text-sm">
              <p className="font-semibold"><StatusIcon name="fail" className="mr-1" />{issues.length} problem{issues.length === 1 ? '' : 's'} to correct in the file; nothing can be stored until they are fixed.</p>
              <ul className="mt-2 list-disc pl-5">{issues.map((i, n) => <li key={n}><span className="num">Line {i.line}</span>{i.column ? <>, <span className="num">{i.column}</span></> : null}: {i.message}</li>)}</ul>
            </div>
          )}
          <PreviewTable preview={state.preview} />
          <button type="button" className={`${buttonClassName} mt-4`} disabled={!state.preview.ok} onClick={store}>Store as the register</button>
        </>
      ) : null}
    </div>
  );
}
