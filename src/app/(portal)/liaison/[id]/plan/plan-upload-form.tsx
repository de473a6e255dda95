'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { coordinateSystemSchema } from '@/lib/validation/plan-schemas';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';

type Outcome = { ok: true; text: string } | { ok: false; text: string; problems: string[] } | null;

const contentTypeOf = (name: string) => (/\.csv$/i.test(name) ? 'text/csv' : 'application/geo+json');

/** Upload the outlines (GeoJSON, or a CSV of vertices) with the coordinate system they are in; refused files list every problem. */
export function PlanUploadForm({ schemeId, limitBytes }: { schemeId: string; limitBytes: number }) {
  const router = useRouter();
  const [file, setFile] = useState<File | null>(null);
  const [system, setSystem] = useState('');
  const [errors, setErrors] = useState<{ file?: string; system?: string }>({});
  const [outcome, setOutcome] = useState<Outcome>(null);
  const [busy, setBusy] = useState(false);

  const submit = async (event: React.FormEvent) => {
    event.preventDefault();
    const checked = coordinateSystemSchema.safeParse(system);
    const found = { file: !file ? 'Choose the plan file (.geojson or .csv).' : file.size > limitBytes ? `The file is ${Math.ceil(file.size / 1024)} KB; a plan file may be at most ${Math.round(limitBytes / 1024)} KB.` : undefined, system: checked.success ? undefined : `Coordinate system ${checked.error.issues[0].message}` };
    setErrors(found);
    if (found.file || found.system || !file) return;
    setBusy(true);
    const response = await fetch(`/api/parcels/${schemeId}/plan`, { method: 'POST', body: file, headers: { 'content-type': contentTypeOf(file.name), 'x-file-name': encodeURIComponent(file.name), 'x-coordinate-system': encodeURIComponent(system) } });
    const body = await response.json();
    setBusy(false);
    if (!response.ok) return setOutcome({ ok: false, text: body.error, problems: (body.issues ?? []).map((i: { message: string }) => i.message) });
    setOutcome({ ok: true, text: `Stored as plan version ${body.version} with ${body.outlines} outline${body.outlines === 1 ? '' : 's'}.${body.withoutOutline.length ? ` Parcels without an outline: ${body.withoutOutline.join(', ')}.` : ''}` });
    router.refresh();
  };

  return (
    <form onSubmit={submit} noValidate className="max-w-xl">
      <FormField id="plan-file" label="Plan file (GeoJSON or CSV of vertices)" error={errors.file}>
        <input id="plan-file" type="file" accept=".geojson,.json,.csv,application/geo+json,text/csv" className={inputClassName} aria-invalid={errors.file ? true : undefined} aria-describedby={errors.file ? 'plan-file-error' : undefined} onChange={(e) => setFile(e.target.files?.[0] ?? null)} />
      </FormField>
      <FormField id="plan-system" label="Coordinate system of the file" hint="A projected system in metres, e.g. British National Grid (EPSG:27700)." error={errors.system}>
        <input id="plan-system" value={system} onChange={(e) => setSystem(e.target.value)} className={inputClassName} aria-invalid={errors.system ? true : undefined} aria-describedby={errors.system ? 'plan-system-hint plan-system-error' : 'plan-system-hint'} />
      </FormField>
      <button type="submit" className={buttonClassName} disabled={busy}>Upload the plan</button>
      {outcome?.ok ? <p role="status" className="mt-3 text-sm text-verdict-pass"><StatusIcon name="pass" className="mr-1" />{outcome.text}</p> : null}
      {outcome && !outcome.ok ? (
        <div role="alert" className="mt-3 border-l-4 border-verdict-fail bg-paper-deep px-4 py-3 text-sm">
          <p className="font-semibold"><StatusIcon name="fail" className="mr-1" />{outcome.text}</p>
          {outcome.problems.length ? <ul className="mt-2 list-disc pl-5">{outcome.problems.map((p, i) => <li key={i}>{p}</li>)}</ul> : null}
        </div>
      ) : null}
    </form>
  );
}
