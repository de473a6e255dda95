'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { UPLOAD_LIMIT_BYTES, describeBytes } from '@/lib/uploads/upload-limits';
import type { SurveySection } from '@/lib/validation/survey-csv';
import { buttonClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { SurveyPreview } from './survey-preview';

type Issue = { path: string; message: string };
type State =
  | { kind: 'idle' }
  | { kind: 'checking'; name: string }
  | { kind: 'refused'; name: string; error: string; issues: Issue[] }
  | { kind: 'checked'; file: File; sections: SurveySection[]; rowCount: number };

const LIMIT = UPLOAD_LIMIT_BYTES['survey-csv'];

async function post(url: string, file: File): Promise<{ ok: boolean; body: { error?: string; issues?: Issue[]; sections?: SurveySection[]; rowCount?: number } }> {
  try {
    const response = await fetch(url, { method: 'POST', body: file, headers: { 'content-type': 'text/csv', 'x-file-name': encodeURIComponent(file.name) } });
    return { ok: response.ok, body: await response.json().catch(() => ({ error: `The server answered HTTP ${response.status}.` })) };
  } catch {
    return { ok: false, body: { error: 'The server could not be reached; nothing was stored.' } };
  }
}

/** Choose a survey CSV: it is checked on the server and previewed; only "Use this survey" stores it. */
export function SurveyUpload({ schemeId, revisionId, lengthUnit, current }: { schemeId: string; revisionId: string; lengthUnit: string; current: { originalName: string; sections: number } | null }) {
  const router = useRouter();
  const [state, setState] = useState<State>({ kind: 'idle' });
  const [saving, setSaving] = useState(false);

  const check = async (file: File | undefined) => {
    if (!file) return setState({ kind: 'idle' });
    if (file.size > LIMIT) return setState({ kind: 'refused', name: file.name, error: `The file is ${describeBytes(file.size)}; a survey CSV may be at most ${describeBytes(LIMIT)}. Nothing was stored.`, issues: [] });
    setState({ kind: 'checking', name: file.name });
    const { ok, body } = await post(`/api/uploads/survey-preview?revision=${encodeURIComponent(revisionId)}`, file);
    if (ok && body.sections) setState({ kind: 'checked', file, sections: body.sections, rowCount: body.rowCount ?? 0 });
    else setState({ kind: 'refused', name: file.name, error: body.error ?? 'The survey was refused.', issues: body.issues ?? [] });
  };

  const use = async () => {
    if (state.kind !== 'checked') return;
    setSaving(true);
    const { ok, body } = await post(`/api/uploads/survey?revision=${encodeURIComponent(revisionId)}`, state.file);
    setSaving(false);
    if (!ok) return setState({ kind: 'refused', name: state.file.name, error: body.error ?? 'The survey was refused.', issues: body.issues ?? [] });
    router.push(`/schemes/${schemeId}/wizard/flows`);
    router.refresh();
  };

  return (
    <div>
      {current ? <p className="mb-3 text-sm">In use now: <strong>{current.originalName}</strong>, {current.sections} cross-sections. Choosing another file replaces it once you use it.</p> : null}
      <label htmlFor="survey-file" className="block text-sm font-semibold">Survey CSV file</label>
      <p id="survey-file-hint" className="text-xs text-ink-faint">
        One row per ground point, columns <code className="num">distance_upstream, station, elevation, bank, manning_n</code>, in {lengthUnit}. The first section is at 0 {lengthUnit}, the structure; stations run left to right looking downstream; mark the banks <code>left</code> and <code>right</code>; give n on each section’s first row and where it changes. At most {describeBytes(LIMIT)}.
      </p>
      <input id="survey-file" type="file" accept=".csv,text/csv" aria-describedby="survey-file-hint" className="mt-2 block text-sm" onChange={(e) => void check(e.target.files?.[0])} />
      <div aria-live="polite" className="mt-4">
        {state.kind === 'checking' ? <p className="text-sm text-ink-soft">Checking {state.name}…</p> : null}
        {state.kind === 'refused' ? (
          <div role="alert" className="rounded border border-verdict-fail bg-white p-4 text-sm" data-testid="survey-errors">
            <p className="font-semibold text-verdict-fail"><StatusIcon name="fail" className="mr-1" />{state.name}: {state.error}</p>
            {state.issues.length > 0 ? (
              <ul className="mt-2 space-y-1">
                {state.issues.map((i, n) => <li key={n}><span className="num font-semibold">{i.path === 'file' ? 'File' : i.path.replace(/^line/, 'Line')}</span>: {i.message}</li>)}
              </ul>
            ) : null}
          </div>
        ) : null}
        {state.kind === 'checked' ? (
          <div>
            <p role="status" className="text-sm text-verdict-pass"><StatusIcon name="pass" className="mr-1" />{state.file.name}: {state.sections.length} cross-sections, {state.rowCount} points, no problems found. Nothing is stored until you use it.</p>
            <SurveyPreview sections={state.sections} lengthUnit={lengthUnit} />
            <button type="button" className={`${buttonClassName} mt-4`} disabled={saving} onClick={() => void use()}>{saving ? 'Storing…' : 'Use this survey and continue'}</button>
          </div>
        ) : null}
      </div>
    </div>
  );
}
