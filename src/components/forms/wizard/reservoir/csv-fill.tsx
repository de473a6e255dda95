'use client';

import { useState } from 'react';
import { ROUTING_CSV_LIMIT_BYTES, describeBytes } from '@/lib/uploads/upload-limits';
import { StatusIcon } from '@/components/ui/status-icon';

export type CsvTable = 'hydrograph' | 'storage';

/** What the server read from the file: its rows, and for a storage table whether it gives areas or volumes. */
export interface CsvRows {
  rows: Record<string, number>[];
  kind?: 'level-area' | 'level-volume';
}

type Issue = { path: string; message: string };
type State = { kind: 'idle' } | { kind: 'checking'; name: string } | { kind: 'refused'; name: string; error: string; issues: Issue[] } | { kind: 'filled'; name: string; rows: number };

/**
 * Reads a CSV file on the server (the same checks as the case file, line by line) and puts its rows in the table
 * above; nothing is stored until the step is saved.
 */
export function CsvFill({ idPrefix, revisionId, table, hint, onRows }: { idPrefix: string; revisionId: string; table: CsvTable; hint: string; onRows: (read: CsvRows) => void }) {
  const [state, setState] = useState<State>({ kind: 'idle' });
  const id = `${idPrefix}-csv`;
  const read = async (file: File | undefined) => {
    if (!file) return setState({ kind: 'idle' });
    if (file.size > ROUTING_CSV_LIMIT_BYTES) return setState({ kind: 'refused', name: file.name, error: `The file is ${describeBytes(file.size)}; it may be at most ${describeBytes(ROUTING_CSV_LIMIT_BYTES)}.`, issues: [] });
    setState({ kind: 'checking', name: file.name });
    try {
      const response = await fetch(`/api/uploads/routing-csv-preview?revision=${encodeURIComponent(revisionId)}&table=${table}`, { method: 'POST', body: file, headers: { 'content-type': 'text/csv', 'x-file-name': encodeURIComponent(file.name) } });
      const body = (await response.json().catch(() => ({ error: `The server answered HTTP ${response.status}.` }))) as { error?: string; issues?: Issue[]; rows?: Record<string, number>[]; kind?: CsvRows['kind'] };
      if (response.ok && body.rows) {
        onRows({ rows: body.rows, kind: body.kind });
        setState({ kind: 'filled', name: file.name, rows: body.rows.length });
      } else setState({ kind: 'refused', name: file.name, error: body.error ?? 'The file was refused.', issues: body.issues ?? [] });
    } catch {
      setState({ kind: 'refused', name: file.name, error: 'The server could not be reached; the table is unchanged.', issues: [] });
    }
  };
  return (
    <div className="max-w-md">
      <label htmlFor={id} className="font-semibold">Or fill the table from a CSV file</label>
      <p id={`${id}-hint`} className="text-xs text-ink-faint">{hint} At most {describeBytes(ROUTING_CSV_LIMIT_BYTES)}.</p>
      <input id={id} type="file" accept=".csv,text/csv" aria-describedby={`${id}-hint`} className="mt-1 block text-sm" onChange={(e) => void read(e.target.files?.[0])} />
      <div aria-live="polite" className="mt-2">
        {state.kind === 'checking' ? <p className="text-ink-soft">Reading {state.name}…</p> : null}
        {state.kind === 'filled' ? <p role="status" className="text-verdict-pass"><StatusIcon name="pass" className="mr-1" />{state.name}: {state.rows} rows put in the table. Saving the step keeps them.</p> : null}
        {state.kind === 'refused' ? (
          <div role="alert" className="rounded border border-verdict-fail bg-white p-3" data-testid={`${idPrefix}-csv-errors`}>
            <p className="font-semibold text-verdict-fail"><StatusIcon name="fail" className="mr-1" />{state.name}: {state.error}</p>
            {state.issues.length > 0 ? <ul className="mt-1 space-y-1">{state.issues.map((i, n) => <li key={n}><span className="num font-semibold">{i.path === 'file' ? 'File' : i.path.replace(/^line/, 'Line')}</span>: {i.message}</li>)}</ul> : null}
          </div>
        ) : null}
      </div>
    </div>
  );
}
