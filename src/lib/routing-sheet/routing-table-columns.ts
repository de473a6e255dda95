import type { RoutingStep } from '@/lib/hydraulics/routing/routing-result';
import { unitWords } from '@/lib/revisions/draft-inputs';
import type { CaseUnits } from '@/lib/validation/case-schema';
import { hoursOf, volumeUnit } from './event-routing';

export interface RoutingColumn {
  label: string;
  value: (step: RoutingStep) => number;
  digits: number;
}

/** Columns of the routing table, shared by the results page, its CSV download and the calculation sheet. */
export function routingTableColumns(units: CaseUnits, datum: string | null): RoutingColumn[] {
  const u = unitWords(units);
  const above = datum?.trim() ? datum.trim() : 'the scheme datum';
  return [
    { label: 'Time (h)', value: (s) => hoursOf(s.time), digits: 3 },
    { label: `Inflow (${u.discharge})`, value: (s) => s.inflow, digits: 3 },
    { label: `Outflow (${u.discharge})`, value: (s) => s.outflow, digits: 3 },
    { label: `Reservoir level (${u.length} above ${above})`, value: (s) => s.level, digits: 3 },
    { label: `Storage above the start level (${volumeUnit(u.length)})`, value: (s) => s.storage, digits: 0 },
  ];
}
