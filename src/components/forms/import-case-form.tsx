'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { UPLOAD_LIMIT_BYTES, describeBytes } from '@/lib/uploads/upload-limits';
import { StatusIcon } from '@/components/ui/status-icon';

type Problem = { error: string; issues: { path: string; message: string }[] };

/** Starts a scheme from a Sillmark case file: checked whole on the server; a file with problems stores nothing. */
export function ImportCaseForm() {
  const router = useRouter();
  const [problem, setProblem] = useState<Problem | null>(null);
  const [busy, setBusy] = useState(false);
  const limit = UPLOAD_LIMIT_BYTES['case-json'];

  const upload = async (file: File | undefined) => {
    setProblem(null);
    if (!file) return;
    if (file.size > limit) return setProblem({ error: `The file is ${describeBytes(file.size)}; a case file may be at most ${describeBytes(limit)}. Nothing was stored.`, issues: [] });
    setBusy(true);
    const response = await fetch('/api/schemes/import', { method: 'POST', body: file, headers: { 'content-type': 'application/json', 'x-file-name': encodeURIComponent(file.name) } }).catch(() => null);
    const body = response ? await response.json().catch(() => ({})) : { error: 'The server could not be reached; nothing was stored.' };
    setBusy(false);
    if (response?.ok) return router.push(`/schemes/${body.schemeId}/results`);
    setProblem({ error: body.error ?? 'The case file was refused.', issues: body.issues ?? [] });
  };

  return (
    <div className="rounded border border-paper-edge bg-white/60 p-4">
      <label htmlFor="case-file" className="block text-sm font-semibold">Start a scheme from a case file</label>
      <p id="case-file-hint" className="text-xs text-ink-faint">A Sillmark case file (JSON), for example one downloaded from another scheme. At most {describeBytes(limit)}.</p>
      <input id="case-file" type="file" accept=".json,application/json" aria-describedby="case-file-hint" className="mt-2 block text-sm" disabled={busy} onChange={(e) => void upload(e.target.files?.[0])} />
      <div aria-live="polite">
        {busy ? <p className="mt-2 text-sm text-ink-soft">Checking the case file…</p> : null}
        {problem ? (
          <div role="alert" className="mt-3 text-sm text-verdict-fail">
            <p><StatusIcon name="fail" className="mr-1" />{problem.error}</p>
            <ul className="ml-5 list-disc">{problem.issues.map((i) => <li key={`${i.path}${i.message}`}>{i.message}</li>)}</ul>
          </div>
        ) : null}
      </div>
    </div>
  );
}
