import type { EventResult } from '@/lib/hydraulics/case-result';
import type { RoutingResult } from '@/lib/hydraulics/routing/routing-result';
import { hoursOf } from '@/lib/routing-sheet/event-routing';
import { routingChartData } from '@/lib/routing-sheet/routing-chart-data';
import { routingTableColumns } from '@/lib/routing-sheet/routing-table-columns';
import type { CaseUnits } from '@/lib/validation/case-schema';
import { RoutingChart } from '@/components/charts/routing-chart';
import { RoutingChartTable } from './routing-chart-table';
import { RoutingFacts } from './routing-facts';
import { RoutingInputs } from './routing-inputs';
import { RoutingTable } from './routing-table';
import { StatusIcon } from '@/components/ui/status-icon';

type Props = {
  event: EventResult;
  routing: RoutingResult;
  caseUnits: CaseUnits;
  units: { length: string; discharge: string };
  datum: string | null;
  csvHref: string;
};

/** A flood routed through the reservoir: the chart and its numbers, the peak figures, the inputs, the assumptions and the table. */
export function RoutingSection({ event, routing, caseUnits, units, datum, csvHref }: Props) {
  const levelUnit = `${units.length} above ${datum?.trim() ? datum.trim() : 'the scheme datum'}`;
  const columns = routingTableColumns(caseUnits, datum);
  const caption = `${event.name} routed through the reservoir: inflow peaks at ${routing.inflowPeak.discharge.toFixed(2)} ${units.discharge} after ${hoursOf(routing.inflowPeak.time).toFixed(2)} h, outflow at ${routing.outflowPeak.discharge.toFixed(2)} ${units.discharge} after ${hoursOf(routing.outflowPeak.time).toFixed(2)} h; the reservoir peaks at ${routing.peakLevel.level.toFixed(3)} ${levelUnit}.`;
  return (
    <>
      <section aria-labelledby="routing-heading" className="mb-10">
        <h2 id="routing-heading" className="mb-3 text-lg font-semibold">Flood routed through the reservoir: {event.name}</h2>
        <RoutingChart data={routingChartData(routing)} dischargeUnit={units.discharge} lengthUnit={units.length} levelTitle={`Reservoir level (${levelUnit})`} caption={caption} />
        <RoutingChartTable routing={routing} units={units} levelUnit={levelUnit} />
        <h3 className="mb-2 mt-6 font-semibold">Peak figures</h3>
        <RoutingFacts routing={routing} units={units} levelUnit={levelUnit} />
        <h3 className="mb-2 mt-6 font-semibold">What was routed</h3>
        <RoutingInputs routing={routing} units={units} levelUnit={levelUnit} />
        <h3 className="mb-2 mt-6 font-semibold">Assumptions</h3>
        <ul className="list-disc space-y-1 pl-5 text-sm">{routing.assumptions.map((a) => <li key={a}>{a}</li>)}</ul>
        <p role="note" className="mt-4 border-l-4 border-verdict-caution bg-paper-deep px-4 py-3 text-sm text-ink-soft">
          <StatusIcon name="caution" className="mr-1" />
          <strong className="font-semibold text-ink">Caution.</strong> The reservoir is taken as level from the structure to its head (level-pool routing). Wind set-up,
          waves, a spillway partly blocked by debris, and a reservoir already above the start level when the flood arrives all raise the peak level above the figure shown.
        </p>
      </section>
      <section aria-labelledby="routing-table-heading" className="mb-10">
        <h2 id="routing-table-heading" className="mb-3 text-lg font-semibold">Routing table: {event.name}</h2>
        <RoutingTable columns={columns.map(({ label, digits }) => ({ label, digits }))} values={routing.steps.map((s) => columns.map((c) => c.value(s)))} csvHref={csvHref} eventName={event.name} />
      </section>
    </>
  );
}
