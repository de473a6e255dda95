import type { RoutingResult } from '@/lib/hydraulics/routing/routing-result';
import { hoursOf } from '@/lib/routing-sheet/event-routing';
import { sampledSteps } from '@/lib/routing-sheet/routing-chart-data';
import { DataTable } from '@/components/ui/data-table';

const ROWS = 25;

/** The chart's text alternative: the numbers it shows at evenly spaced times and at each peak, opened on demand. */
export function RoutingChartTable({ routing, units, levelUnit }: { routing: RoutingResult; units: { discharge: string }; levelUnit: string }) {
  const steps = sampledSteps(routing, ROWS);
  return (
    <details className="mt-3 text-sm">
      <summary className="cursor-pointer text-accent underline">The chart’s numbers as a table ({steps.length} times{steps.length < routing.steps.length ? `, of ${routing.steps.length} computed` : ''})</summary>
      <div className="mt-2">
        <DataTable caption="Inflow, outflow and reservoir level against time, as drawn on the chart" captionStyle="note" columns={[{ label: 'Time (h)', numeric: true }, { label: `Inflow (${units.discharge})`, numeric: true }, { label: `Outflow (${units.discharge})`, numeric: true }, { label: `Reservoir level (${levelUnit})`, numeric: true }]}>
          {steps.map((s) => (
            <tr key={s.time} className="border-b border-paper-edge">
              <td className="num py-1 pr-3 text-right">{hoursOf(s.time).toFixed(2)}</td>
              <td className="num py-1 pr-3 text-right">{s.inflow.toFixed(3)}</td>
              <td className="num py-1 pr-3 text-right">{s.outflow.toFixed(3)}</td>
              <td className="num py-1 text-right">{s.level.toFixed(3)}</td>
            </tr>
          ))}
        </DataTable>
      </div>
    </details>
  );
}
