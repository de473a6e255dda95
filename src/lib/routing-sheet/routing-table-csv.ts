import { toSafeCsv } from '@/lib/csv/to-safe-csv';
import type { RoutingResult } from '@/lib/hydraulics/routing/routing-result';
import type { CaseUnits } from '@/lib/validation/case-schema';
import { routingTableColumns } from './routing-table-columns';

export interface RoutingTableCsvOptions {
  scheme: { reference: string; name: string };
  revision: number;
  eventName: string;
  routing: RoutingResult;
  units: CaseUnits;
  datum: string | null;
  engineVersion: string;
}

/**
 * The routing table of one event as CSV at full precision: a block naming what the table is (scheme, revision,
 * event, units, datum, engine), a blank line, then one row per time step. The scheme's name, the event's name and
 * the datum are the designer's own text, hence the formula-safe writer.
 */
export function routingTableCsv(o: RoutingTableCsvOptions): string {
  const columns = routingTableColumns(o.units, o.datum);
  const meta = [
    ['Scheme', `${o.scheme.reference} ${o.scheme.name}`],
    ['Revision', o.revision],
    ['Event', o.eventName],
    ['Units', o.units === 'US' ? 'US customary (ft, ft³/s); times in hours' : 'SI (m, m³/s); times in hours'],
    ['Level datum', o.datum?.trim() ? o.datum.trim() : 'the scheme datum (not named)'],
    ['Routing method', o.routing.methodSource],
    ['Engine version', o.engineVersion],
    [],
  ];
  const rows = o.routing.steps.map((step) => columns.map((c) => c.value(step)));
  return toSafeCsv(['Sillmark routing table'], [...meta, columns.map((c) => c.label), ...rows]);
}
