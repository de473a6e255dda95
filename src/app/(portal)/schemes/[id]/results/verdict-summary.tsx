import type { ReactNode } from 'react';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import { StatusIcon } from '@/components/ui/status-icon';

const f = (x: number, d = 3) => x.toFixed(d);

export function VerdictWord({ pass, children }: { pass: boolean; children?: ReactNode }) {
  return (
    <span className={`inline-flex items-center gap-1 font-semibold ${pass ? 'text-verdict-pass' : 'text-verdict-fail'}`}>
      <StatusIcon name={pass ? 'pass' : 'fail'} />
      {children ?? (pass ? 'Pass' : 'Fail')}
    </span>
  );
}

/** The verdict first: overall, the governing event, and every limit of every event with its margin. */
export function VerdictSummary({ result, lengthUnit, governingName }: { result: CaseResult; lengthUnit: string; governingName: string | null }) {
  const pass = result.verdict === 'pass';
  const u = lengthUnit;
  const noLimits = result.events.every((e) => e.limits.length === 0);
  return (
    <section aria-labelledby="verdict-heading" className={`mb-8 rounded border-2 p-5 ${pass ? 'border-verdict-pass' : 'border-verdict-fail'} bg-white/70`}>
      <h2 id="verdict-heading" className="text-xl font-semibold" data-testid="verdict">
        <VerdictWord pass={pass}>{pass ? (noLimits ? 'Pass — but no limits were set' : 'Pass: every limit is met in every event') : 'Fail: at least one limit is exceeded'}</VerdictWord>
      </h2>
      {result.robustness?.status === 'not-robust' ? (
        <p className="mt-2 text-sm font-semibold text-verdict-caution" data-testid="robustness">
          <StatusIcon name="caution" className="mr-1" />Passes, but not robustly: {result.robustness.reasons.join('; ')}.
        </p>
      ) : result.robustness?.status === 'robust' && !noLimits ? (
        <p className="mt-2 text-sm" data-testid="robustness">Robust: the least margin is at least the minimum margin of <span className="num">{f(result.robustness.minimumMargin)} {u}</span>{result.sensitivity ? ', and every sensitivity run passes' : ' (no sensitivity runs were asked for)'}.</p>
      ) : null}
      {result.governingEvent ? (
        <p className="mt-1 text-sm">Governing event (least margin): <strong>{result.governingEvent.name}</strong>, margin <span className="num">{f(result.governingEvent.leastMargin)} {u}</span>.{governingName && governingName !== result.governingEvent.name ? ` You marked ${governingName} as the design event.` : ''}</p>
      ) : null}
      {result.events.map((e) => (e.limits.length === 0 ? null : (
        <div key={e.name} role="region" aria-label={`Limits in ${e.name}`} tabIndex={0} className="scroll-cue relative mt-4 overflow-x-auto">
          <table className="w-full border-collapse text-sm">
            <caption className="mb-1 text-left font-semibold">{e.name}: <VerdictWord pass={e.verdict === 'pass'} /></caption>
            <thead>
              <tr className="border-b border-paper-edge text-left text-ink-soft">
                <th scope="col" className="py-1 pr-3">Limit</th>
                <th scope="col" className="hidden py-1 pr-3 text-right sm:table-cell">Distance ({u})</th>
                <th scope="col" className="hidden py-1 pr-3 text-right sm:table-cell">Maximum level ({u})</th>
                <th scope="col" className="hidden py-1 pr-3 text-right sm:table-cell">Freeboard ({u})</th>
                <th scope="col" className="hidden py-1 pr-3 text-right sm:table-cell">Water level with / without ({u})</th>
                <th scope="col" className="py-1 pr-3 text-right">Margin ({u})</th>
                <th scope="col" className="py-1">Result</th>
              </tr>
            </thead>
            <tbody>
              {e.limits.map((l) => (
                <tr key={l.label} className="border-b border-paper-edge">
                  <th scope="row" className="py-1 pr-3 text-left font-normal">
                    {l.label}{l.source === 'beyond-profile' ? <span className="block text-xs text-ink-faint">beyond the backwater: level without the scheme</span> : null}{l.source === 'reservoir' ? <span className="block text-xs text-ink-faint">within the reservoir: checked against the peak reservoir level</span> : null}
                    {/* On a phone the key columns (margin, result) stay; the rest are stacked under the limit's name. */}
                    <span className="num block text-xs text-ink-soft sm:hidden">{f(l.distanceUpstream, 1)} {u} upstream · maximum {f(l.maxLevel)} · freeboard {f(l.freeboard)} · water {f(l.waterLevel)} / {f(l.withoutSchemeLevel)} without</span>
                  </th>
                  <td className="num hidden py-1 pr-3 text-right sm:table-cell">{f(l.distanceUpstream, 1)}</td>
                  <td className="num hidden py-1 pr-3 text-right sm:table-cell">{f(l.maxLevel)}</td>
                  <td className="num hidden py-1 pr-3 text-right sm:table-cell">{f(l.freeboard)}</td>
                  <td className="num hidden py-1 pr-3 text-right sm:table-cell">{f(l.waterLevel)} / {f(l.withoutSchemeLevel)}</td>
                  <td className="num py-1 pr-3 text-right">{f(l.margin)}</td>
                  <td className="py-1"><VerdictWord pass={l.pass} /></td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )))}
    </section>
  );
}
