import { CautionNote } from '@/components/ui/caution-note';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import { StatusIcon } from '@/components/ui/status-icon';
import { quantity, unitsOf } from './quantities';

function Verdict({ pass }: { pass: boolean }) {
  return pass ? <span className="text-verdict-pass"><StatusIcon name="pass" className="mr-1" />pass</span> : <span className="font-semibold text-verdict-fail"><StatusIcon name="fail" className="mr-1" />fail</span>;
}

/** The governing results of a revision: verdict, each event's control and extents, and each flood-level limit. */
export function ResultsSummary({ results, caption = 'Results' }: { results: CaseResult; caption?: string }) {
  const u = unitsOf(results.units);
  const pass = results.verdict === 'pass';
  return (
    <div className="space-y-4">
      <p role="status" className={`rounded border-l-4 px-4 py-3 ${pass ? 'border-verdict-pass bg-white/70' : 'border-verdict-fail bg-white/70'}`}>
        <span className="font-semibold">Verdict: <Verdict pass={pass} /></span>{' '}
        <span className="text-ink-soft">{pass ? 'every flood-level limit is met for every design event.' : 'at least one flood-level limit is not met.'}</span>
        {results.governingEvent ? <span className="text-ink-soft"> Governing event: {results.governingEvent.name}, least margin <span className="num">{quantity(results.governingEvent.leastMargin, u.length)}</span>.</span> : null}
      </p>
      <div role="region" aria-label="Results by event" tabIndex={0} className="scroll-cue relative overflow-x-auto">
        <table className="w-full border-collapse text-sm">
          <caption className="mb-1 text-left text-xs text-ink-faint">{caption}: each design event (engine {results.engineVersion})</caption>
          <thead>
            <tr className="border-b border-paper-edge text-left text-ink-soft">
              <th scope="col" className="py-2 pr-3">Event</th>
              <th scope="col" className="py-2 pr-3 text-right">Discharge</th>
              <th scope="col" className="py-2 pr-3 text-right">Head over crest</th>
              <th scope="col" className="py-2 pr-3 text-right">Control depth</th>
              <th scope="col" className="py-2 pr-3 text-right">Control level</th>
              <th scope="col" className="py-2 pr-3 text-right">Extent of impact</th>
              <th scope="col" className="py-2 pr-3 text-right">Extent of inundation</th>
              <th scope="col" className="py-2">Verdict</th>
            </tr>
          </thead>
          <tbody>
            {results.events.map((e) => (
              <tr key={e.name} className="border-b border-paper-edge">
                <th scope="row" className="py-2 pr-3 text-left font-normal">{e.name}</th>
                <td className="num whitespace-nowrap py-2 pr-3 text-right">{quantity(e.discharge, u.discharge, 2)}</td>
                <td className="num whitespace-nowrap py-2 pr-3 text-right">{e.control.type === 'weir' ? quantity(e.control.head, u.length) : 'no crest'}</td>
                <td className="num whitespace-nowrap py-2 pr-3 text-right">{quantity(e.control.depth, u.length)}</td>
                <td className="num whitespace-nowrap py-2 pr-3 text-right">{quantity(e.control.level, u.length)}</td>
                <td className="num whitespace-nowrap py-2 pr-3 text-right">{quantity(e.extent.distanceUpstream, u.length, 0)}</td>
                <td className="num whitespace-nowrap py-2 pr-3 text-right">{e.inundation ? (e.inundation.withScheme.totalLength > 0 ? quantity(e.inundation.withScheme.extentUpstream, u.length, 0) : 'none') : 'not checked'}</td>
                <td className="py-2"><Verdict pass={e.verdict === 'pass'} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {results.events.some((e) => e.limits.length) ? (
        <div role="region" aria-label="Limits by event" tabIndex={0} className="scroll-cue relative overflow-x-auto">
          <table className="w-full border-collapse text-sm">
            <caption className="mb-1 text-left text-xs text-ink-faint">Flood-level limits (water level with the scheme against each limit less its freeboard)</caption>
            <thead>
              <tr className="border-b border-paper-edge text-left text-ink-soft">
                <th scope="col" className="py-2 pr-3">Event</th>
                <th scope="col" className="py-2 pr-3">Limit</th>
                <th scope="col" className="py-2 pr-3 text-right">Upstream</th>
                <th scope="col" className="py-2 pr-3 text-right">Limit level</th>
                <th scope="col" className="py-2 pr-3 text-right">Water level</th>
                <th scope="col" className="py-2 pr-3 text-right">Margin</th>
                <th scope="col" className="py-2">Outcome</th>
              </tr>
            </thead>
            <tbody>
              {results.events.flatMap((e) =>
                e.limits.map((l) => (
                  <tr key={`${e.name}-${l.label}`} className="border-b border-paper-edge">
                    <td className="py-2 pr-3">{e.name}</td>
                    <td className="py-2 pr-3">{l.label}</td>
                    <td className="num whitespace-nowrap py-2 pr-3 text-right">{quantity(l.distanceUpstream, u.length, 0)}</td>
                    <td className="num whitespace-nowrap py-2 pr-3 text-right">{quantity(l.maxLevel, u.length)}</td>
                    <td className="num whitespace-nowrap py-2 pr-3 text-right">{quantity(l.waterLevel, u.length)}</td>
                    <td className="num whitespace-nowrap py-2 pr-3 text-right">{quantity(l.margin, u.length)}</td>
                    <td className="py-2">{l.pass ? <span className="text-verdict-pass"><StatusIcon name="pass" className="mr-1" />met</span> : <span className="font-semibold text-verdict-fail"><StatusIcon name="fail" className="mr-1" />not met</span>}</td>
                  </tr>
                )),
              )}
            </tbody>
          </table>
        </div>
      ) : null}
      <CautionNote />
    </div>
  );
}
