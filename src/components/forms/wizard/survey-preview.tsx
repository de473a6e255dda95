'use client';

import type { SurveySection } from '@/lib/validation/survey-csv';
import { CrossSectionChart } from '@/components/charts/cross-section-chart';

const MAX_PLOTS = 12;

function roughness(n: SurveySection['manningN']): string {
  return typeof n === 'number' ? n.toFixed(3) : `${n.left.toFixed(3)} | ${n.channel.toFixed(3)} | ${n.right.toFixed(3)}`;
}

/** The checked survey before it is stored: one table row and one plot per cross-section. */
export function SurveyPreview({ sections, lengthUnit }: { sections: SurveySection[]; lengthUnit: string }) {
  const u = lengthUnit;
  return (
    <div className="mt-4">
      <div role="region" aria-label="Cross-sections found in the file" tabIndex={0} className="scroll-cue relative overflow-x-auto">
        <table className="w-full border-collapse text-sm">
          <caption className="mb-2 text-left text-sm font-semibold">Cross-sections found in the file</caption>
          <thead>
            <tr className="border-b border-paper-edge text-left text-ink-soft">
              <th scope="col" className="py-1 pr-3">Distance upstream ({u})</th>
              <th scope="col" className="py-1 pr-3">Lines</th>
              <th scope="col" className="py-1 pr-3">Points</th>
              <th scope="col" className="py-1 pr-3">Lowest ground ({u})</th>
              <th scope="col" className="py-1 pr-3">Bank stations ({u})</th>
              <th scope="col" className="py-1">Manning&apos;s n (left | channel | right)</th>
            </tr>
          </thead>
          <tbody>
            {sections.map((s) => (
              <tr key={s.distanceUpstream} className="border-b border-paper-edge">
                <td className="num py-1 pr-3">{s.distanceUpstream.toFixed(1)}</td>
                <td className="num py-1 pr-3">{s.lines[0]}–{s.lines[1]}</td>
                <td className="num py-1 pr-3">{s.points.length}</td>
                <td className="num py-1 pr-3">{Math.min(...s.points.map((p) => p[1])).toFixed(2)}</td>
                <td className="num py-1 pr-3">{s.bankStations ? `${s.bankStations[0]} and ${s.bankStations[1]}` : 'none marked'}</td>
                <td className="num py-1">{roughness(s.manningN)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="mt-4 grid gap-4 md:grid-cols-2">
        {sections.slice(0, MAX_PLOTS).map((s) => (
          <CrossSectionChart key={s.distanceUpstream} height={180} ground={s.points.map(([x, y]) => ({ x, y }))} bankStations={s.bankStations ?? null} lengthUnit={u} yTitle={`Level (${u} above the datum)`} caption={`Section at ${s.distanceUpstream} ${u} upstream: ${s.points.length} points, lowest ground ${Math.min(...s.points.map((p) => p[1])).toFixed(2)} ${u}.`} />
        ))}
      </div>
      {sections.length > MAX_PLOTS ? <p className="mt-2 text-xs text-ink-faint">The first {MAX_PLOTS} of {sections.length} sections are drawn; the table lists them all.</p> : null}
    </div>
  );
}
