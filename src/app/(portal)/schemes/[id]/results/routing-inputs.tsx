import type { RoutingResult } from '@/lib/hydraulics/routing/routing-result';
import { areaUnit, durationWords, hoursOf, volumeUnit } from '@/lib/routing-sheet/event-routing';

const f = (x: number, d = 3) => x.toFixed(d);

const STORAGE_KINDS = { 'level-area': 'a table of surface area by level', 'level-volume': 'a table of stored volume by level', 'constant-area': 'a constant surface area' } as const;

/** What went into the routing, in a sentence each: the inflow, the storage, the start level and the method. */
export function RoutingInputs({ routing: r, units: u, levelUnit }: { routing: RoutingResult; units: { length: string; discharge: string }; levelUnit: string }) {
  const h = r.hydrograph;
  const s = r.storage;
  const inflow =
    h.kind === 'table'
      ? `Inflow hydrograph from ${h.points} points entered by the designer over ${f(hoursOf(h.duration), 2)} h`
      : `Inflow hydrograph shaped from the design discharge and a time to peak of ${durationWords(h.timeToPeak)} by ${h.shapeSource ?? 'a published dimensionless hydrograph'} (${h.points} points over ${f(hoursOf(h.duration), 2)} h)`;
  const range = s.lowestLevel !== null && s.highestLevel !== null ? `, ${s.rows} rows from ${f(s.lowestLevel)} to ${f(s.highestLevel)} ${levelUnit}` : '';
  return (
    <ul className="list-disc space-y-1 pl-5 text-sm" data-testid="routing-inputs">
      <li>{inflow}: peak {f(h.peakInflow)} {u.discharge} at {f(hoursOf(h.timeToPeak), 2)} h, volume {f(h.volume, 0)} {volumeUnit(u.length)}.</li>
      <li>Storage from {STORAGE_KINDS[s.kind]}{range}; surface area {f(s.areaAtStart, 0)} {areaUnit(u.length)} at the start level of {f(s.startLevel)} {levelUnit}.</li>
      <li>{s.reservoirLength !== null ? `The reservoir reaches ${f(s.reservoirLength, 0)} ${u.length} upstream of the structure; limits within that length are checked against the peak reservoir level.` : 'The reservoir’s length along the valley was not given; every limit is checked against the profile upstream.'}</li>
      <li>Routing method: {r.methodSource}.</li>
    </ul>
  );
}
