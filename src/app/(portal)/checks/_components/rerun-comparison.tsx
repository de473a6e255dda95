import type { CaseResult } from '@/lib/hydraulics/case-result';
import type { FrozenRevisionCheck } from '@/lib/review/check-frozen-revision';
import { keyResults } from '@/lib/review/key-results';
import { StatusIcon } from '@/components/ui/status-icon';
import { shownValue } from './quantities';

/**
 * Stored results beside the independent server-side re-run of the frozen inputs, key result by key result;
 * the hashes say whether the whole result (profiles included) is reproduced.
 */
export function RerunComparison({ stored, check }: { stored: CaseResult; check: FrozenRevisionCheck }) {
  const again = new Map(check.rerun.results ? keyResults(check.rerun.results).map((r) => [r.key, r]) : []);
  return (
    <div className="space-y-3">
      <p role="status" className={`rounded border-l-4 bg-white/70 px-4 py-3 text-sm ${check.blockers.length ? 'border-verdict-fail' : 'border-verdict-pass'}`}>
        {check.blockers.length === 0 ? (
          <><StatusIcon name="pass" className="mr-1" /><strong>The independent re-run reproduces the stored results.</strong> Engine {check.rerun.engineVersion}; results SHA-256 <span className="num break-all">{check.rerun.resultsSha256}</span>.</>
        ) : (
          <><StatusIcon name="fail" className="mr-1" /><strong>Countersigning is blocked.</strong> {check.blockers.join(' ')}</>
        )}
      </p>
      <div role="region" aria-label="The independent re-run beside the stored results" tabIndex={0} className="scroll-cue relative overflow-x-auto">
        <table className="w-full border-collapse text-sm">
          <caption className="mb-1 text-left text-xs text-ink-faint">Key results: stored at submission and from the re-run now</caption>
          <thead>
            <tr className="border-b border-paper-edge text-left text-ink-soft">
              <th scope="col" className="py-2 pr-3">Result</th>
              <th scope="col" className="py-2 pr-3 text-right">Stored</th>
              <th scope="col" className="py-2 pr-3 text-right">Re-run</th>
              <th scope="col" className="py-2">Agreement</th>
            </tr>
          </thead>
          <tbody>
            {keyResults(stored).map((row) => {
              const other = again.get(row.key);
              const same = other !== undefined && other.value === row.value;
              return (
                <tr key={row.key} className="border-b border-paper-edge">
                  <th scope="row" className="py-1 pr-3 text-left font-normal">{row.label}</th>
                  <td className="num whitespace-nowrap py-1 pr-3 text-right">{shownValue(row.value, row.kind, stored.units)}</td>
                  <td className="num whitespace-nowrap py-1 pr-3 text-right">{other ? shownValue(other.value, other.kind, stored.units) : '—'}</td>
                  <td className="py-1 text-xs">{same ? <span className="text-verdict-pass"><StatusIcon name="pass" className="mr-1" />same</span> : <span className="font-semibold text-verdict-fail"><StatusIcon name="fail" className="mr-1" />differs</span>}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
