import type { EventResult } from '@/lib/hydraulics/case-result';
import { coefficientWords } from '@/lib/hydraulics/weirs/coefficient-words';

const f = (x: number, d = 3) => x.toFixed(d);
const ENDS: Record<string, string> = {
  threshold: 'where the afflux falls below the impact threshold',
  'reach-end': 'at the upstream end of the reach',
  'beyond-reach': 'beyond the upstream end of the reach: lengthen the reach to locate it',
  'hydraulic-jump': 'at a hydraulic jump',
  'no-impact': 'nowhere: no afflux above the threshold',
};

/** The numbers a checker reads first for one event, each with its unit. */
export function EventFacts({ event: e, units }: { event: EventResult; units: { length: string; discharge: string } }) {
  const u = units.length;
  const rows: [string, string, string?][] = [
    ['Design discharge', `${f(e.discharge)} ${units.discharge}`, e.climateChangeAllowance ? `${f(e.baseDischarge)} ${units.discharge} plus ${e.climateChangeAllowance} % climate-change allowance` : undefined],
    ['Head over the crest', `${f(e.control.head)} ${u}`, e.control.weir ? `${coefficientWords(e.control.weir.coefficient, e.control.weir.coefficientForm)} — ${e.control.weir.coefficientSource}` : undefined],
    ['Control depth', `${f(e.control.depth)} ${u}`, `water level ${f(e.control.level)} ${u} at the structure`],
    ['Normal depth', e.normalDepthExists ? `${f(e.normalDepth)} ${u}` : 'none', e.normalDepthExists ? 'at the control section' : 'the bed is horizontal or adverse'],
    ['Critical depth', `${f(e.criticalDepth)} ${u}`],
    ['Slope and profile', `${e.slopeClass}, ${e.profileType}`, `bed slope ${e.bedSlope.toFixed(5)} m/m`],
    ['Afflux', `${f(e.afflux.atControl)} ${u} at the structure`, e.extent.sense === 'drawdown' ? `a drawdown: the level falls by up to ${f(-e.afflux.min)} ${u}` : `greatest ${f(e.afflux.max)} ${u}`],
    [
      e.extent.sense === 'drawdown' ? 'Extent of drawdown' : 'Extent of impact',
      e.extent.endsBy === 'beyond-reach' ? `beyond ${f(e.extent.distanceUpstream, 0)} ${u} upstream` : `${f(e.extent.distanceUpstream, 0)} ${u} upstream`,
      `ends ${ENDS[e.extent.endsBy] ?? e.extent.endsBy}${e.extent.affluxAtReachEnd !== undefined ? `; afflux there ${f(e.extent.affluxAtReachEnd)} ${u}` : ''}`,
    ],
    ['Extent of inundation', e.inundation ? (e.inundation.withScheme.totalLength > 0 ? `${f(e.inundation.withScheme.extentUpstream, 0)} ${u} upstream` : 'no bank overtopped') : 'not checked', e.inundation ? `${f(e.inundation.withScheme.totalLength, 0)} ${u} of bank flooded with the scheme, ${f(e.inundation.withoutScheme.totalLength, 0)} ${u} without` : 'no bank levels were given'],
    ...(e.jump ? ([['Hydraulic jump', `${f(e.jump.distanceUpstream, 0)} ${u} upstream`, `from ${f(e.jump.upstreamDepth)} to ${f(e.jump.downstreamDepth)} ${u} deep`]] as [string, string, string][]) : []),
  ];
  return (
    <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-2 lg:grid-cols-3" data-testid="event-facts">
      {rows.map(([label, value, note]) => (
        <div key={label} className="border-b border-paper-edge pb-2">
          <dt className="text-ink-soft">{label}</dt>
          <dd className="num text-base">{value}</dd>
          {note ? <dd className="text-xs text-ink-faint">{note}</dd> : null}
        </div>
      ))}
    </dl>
  );
}
