import type { RoutingResult } from '@/lib/hydraulics/routing/routing-result';
import { durationWords, fixedWithoutNegativeZero, hoursOf, volumeUnit } from '@/lib/routing-sheet/event-routing';

const f = (x: number, d = 3) => x.toFixed(d);

type Units = { length: string; discharge: string };

function selfCheckWords(routing: RoutingResult, u: Units): [string, string, string] {
  const check = routing.selfCheck;
  if (!check) return ['Independent check', 'not run', 'the routing was not integrated a second way for this event'];
  return ['Independent check', `${f(check.peakLevelDifference)} ${u.length} in peak level`, `${check.method}: peak level ${f(check.peakLevel)} ${u.length}; peak outflow differs by ${f(check.peakOutflowDifference)} ${u.discharge}`];
}

/** The peak figures of a routed flood, each with its unit and time. */
export function RoutingFacts({ routing: r, units: u, levelUnit }: { routing: RoutingResult; units: Units; levelUnit: string }) {
  const volume = volumeUnit(u.length);
  const balance = r.volumeBalance;
  const refinement = r.refinement;
  const rows: [string, string, string?][] = [
    ['Peak inflow', `${f(r.inflowPeak.discharge)} ${u.discharge}`, `at ${f(hoursOf(r.inflowPeak.time), 2)} h`],
    ['Peak outflow', `${f(r.outflowPeak.discharge)} ${u.discharge}`, `at ${f(hoursOf(r.outflowPeak.time), 2)} h`],
    ['Attenuation', `${f(r.attenuation)} ${u.discharge}`, r.inflowPeak.discharge > 0 ? `the peak is ${f((100 * r.attenuation) / r.inflowPeak.discharge, 1)} % lower leaving the reservoir` : undefined],
    ['Lag of the peak', durationWords(r.lag), 'from peak inflow to peak outflow'],
    ['Peak reservoir level', `${f(r.peakLevel.level)} ${levelUnit}`, `at ${f(hoursOf(r.peakLevel.time), 2)} h; ${f(r.peakLevel.level - r.storage.startLevel)} ${u.length} above the level at the start of the flood`],
    ['Volume balance', `${fixedWithoutNegativeZero(balance.residual, 1)} ${volume} left over`, `inflow ${f(balance.inflow, 0)} ${volume} = outflow ${f(balance.outflow, 0)} ${volume} + change in storage ${f(balance.storageChange, 0)} ${volume}`],
    ['Time step', durationWords(refinement.timeStep), `${refinement.halvings} halving${refinement.halvings === 1 ? '' : 's'}; the last changed the peak level by ${f(refinement.peakLevelChangeOnHalving, 4)} ${u.length} (tolerance ${f(refinement.tolerance, 4)} ${u.length})${refinement.converged ? '' : ' — NOT settled: treat the peak level with care'}`],
    selfCheckWords(r, u),
  ];
  return (
    <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-2 lg:grid-cols-3" data-testid="routing-facts">
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
