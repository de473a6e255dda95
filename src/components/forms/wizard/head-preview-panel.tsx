'use client';

import useSWR from 'swr';
import { coefficientWords } from '@/lib/hydraulics/weirs/coefficient-words';
import type { HeadPreview } from '@/lib/revisions/preview-head';
import { StatusIcon } from '@/components/ui/status-icon';
import { listInWords } from './preview-needs';
import { useDebounced } from './use-debounced';

export const HEAD_PREVIEW_DELAY_MS = 400;

class PreviewError extends Error {
  constructor(message: string, readonly issues: { path: string; message: string }[]) {
    super(message);
  }
}

async function fetchPreview([, revisionId, body]: [string, string, string]): Promise<HeadPreview> {
  const response = await fetch('/api/head-preview', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ revisionId, ...JSON.parse(body) }) });
  const json = await response.json().catch(() => ({}));
  if (!response.ok) throw new PreviewError(json.error ?? `HTTP ${response.status}`, json.issues ?? []);
  return json as HeadPreview;
}

const f = (x: number | null | undefined, digits = 3) => (x === null || x === undefined ? '—' : x.toFixed(digits));

/** The head over the crest and the control depth, worked out by the engine on the server as the designer types. */
/** `waitingFor`: the fields still blank, in words; until they are given nothing is asked of the server. */
export function HeadPreviewPanel({ revisionId, structureJson, waitingFor, lengthUnit, dischargeUnit }: { revisionId: string; structureJson: string; waitingFor: string[]; lengthUnit: string; dischargeUnit: string }) {
  const settled = useDebounced(structureJson, HEAD_PREVIEW_DELAY_MS);
  const waiting = waitingFor.length > 0;
  const { data: answer, error: failure, isValidating } = useSWR<HeadPreview, PreviewError>(waiting ? null : ['head-preview', revisionId, settled], fetchPreview, { keepPreviousData: true, revalidateOnFocus: false, shouldRetryOnError: false });
  const data = waiting ? undefined : answer;
  const error = waiting ? undefined : failure;
  const u = lengthUnit;
  return (
    <section aria-labelledby="head-preview-heading" className="rounded border border-accent/40 bg-accent-wash/60 p-4" data-testid="head-preview">
      <h2 id="head-preview-heading" className="text-sm font-semibold">Head over the crest and control depth</h2>
      <p className="text-xs text-ink-faint">Computed on the server by the engine from these values and the saved channel and flows; not saved until you continue.</p>
      <div aria-live="polite" className="mt-3 text-sm">
        {waiting ? <p data-testid="preview-waiting">Worked out once you give {listInWords(waitingFor)}.</p> : null}
        {!waiting && isValidating && !data ? <p>Working it out…</p> : null}
        {error ? (
          <div role="status" className="text-verdict-caution">
            <p><StatusIcon name="caution" className="mr-1" />Not worked out yet: {error.message}</p>
            <ul className="ml-5 list-disc">{error.issues.map((i) => <li key={`${i.path}${i.message}`}>{i.message}</li>)}</ul>
          </div>
        ) : null}
        {data && !error ? (
          <div className="space-y-3">
            {data.events.map((e) => (
              <dl key={e.name} className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-0.5">
                <dt className="col-span-2 font-semibold">{e.name} <span className="num font-normal text-ink-soft">({f(e.discharge)} {dischargeUnit})</span></dt>
                <dt className="text-ink-soft">Head over the crest</dt><dd className="num" data-testid="preview-head">{f(e.head)} {u}</dd>
                <dt className="text-ink-soft">Control depth</dt><dd className="num" data-testid="preview-control-depth">{f(e.controlDepth)} {u}</dd>
                <dt className="text-ink-soft">Water level at the structure</dt><dd className="num">{f(e.controlLevel)} {u}</dd>
                <dt className="text-ink-soft">Critical, normal depth</dt><dd className="num">{f(e.criticalDepth)} {u}, {e.normalDepth === null ? 'none' : `${f(e.normalDepth)} ${u}`}</dd>
                {e.weir ? (
                  <>
                    <dt className="text-ink-soft">Coefficient</dt>
                    <dd><span className="num">{coefficientWords(e.weir.coefficient, e.weir.coefficientForm)}</span> — {e.weir.coefficientIsDefault ? 'published default' : 'your own value'}<span className="block text-xs text-ink-faint">{e.weir.coefficientSource}</span></dd>
                    <dt className="text-ink-soft">Validity range</dt>
                    <dd className="text-xs">{e.weir.validity.map((c) => <span key={c.name} className="block"><StatusIcon name={c.ok ? 'pass' : 'caution'} className="mr-1" />{c.name} <span className="num">{c.value.toPrecision(3)}</span>{c.min !== undefined ? `, from ${c.min}` : ''}{c.max !== undefined ? ` to ${c.max}` : ''}{c.ok ? '' : ' — outside the range'}</span>)}</dd>
                  </>
                ) : null}
                {e.weir?.submergence && e.weir.submergence.tailwaterHead > 0 && !e.weir.submergence.modular ? <dd className="col-span-2 text-xs text-verdict-caution"><StatusIcon name="caution" className="mr-1" />Submerged by the water downstream: ratio <span className="num">{e.weir.submergence.ratio.toFixed(3)}</span>, discharge reduced by the factor <span className="num">{e.weir.submergence.factor.toFixed(3)}</span> ({e.weir.submergence.relation}).{e.weir.submergence.extrapolated ? ' Past the data of the relation: see the warnings.' : ''}</dd> : null}
                {!e.causesBackwater && e.explanation ? <dd className="col-span-2 text-xs text-verdict-caution"><StatusIcon name="caution" className="mr-1" />{e.explanation}</dd> : null}
              </dl>
            ))}
          </div>
        ) : null}
      </div>
    </section>
  );
}
